using DescentOps.Engine.Components;
using DescentOps.Engine.Randomness;
using DescentOps.Mission.Messages;
using DescentOps.Mission.Station;
using DescentOps.Primitives.Time;
using DescentOps.Rules.Compiled;
using DescentOps.Scenarios.Model;
using DescentOps.Tests.Shared;

namespace DescentOps.Mission.Tests.StationParts;

/// <summary>
/// The station's parts, one transition at a time, on a detached context. Scenarios are the built-in default (2 s of
/// forwarding, 1.08e9 km home) and edits of it that are test inputs of invented missions; expected instants are
/// computed here from the scenario or from the design's own link windows.
/// </summary>
public sealed class StationTransitionTests
{
    private const string Windows = "  forwarding_delay: 2 s\n  link:\n    rotation_period: 10 h\n    latitude: 0 deg\n    start_hour_angle: -90 deg\n";

    private static readonly StationComponent Plain = new(TestScenario.Default.Load());

    private static readonly StationComponent Windowed = new(TestScenario.Default.Replace("  forwarding_delay: 2 s\n", Windows + "  frame_queue_capacity: 2\n").Load());

    private static readonly StationComponent Charged = new(TestScenario.Default
        .Replace("  forwarding_delay: 2 s\n", "  forwarding_delay: 2 s\n  charging:\n    upset_interval: 2 d\n    recovery_time: 6 h\n    during_recovery: lose\n").Load());

    private static readonly Scenario DoseScenario = TestScenario.BuiltIn("station-dies-before-breakthrough.yaml").Load();

    private static ComponentContext At(double seconds) =>
        ComponentContext.Detached(MissionIds.Station, new RandomStream(1, MissionIds.Station), SimTime.FromSecondsSinceEpoch(seconds));

    private static TelemetryFrame Frame(long sequence) => new(sequence, SimTime.Epoch, "Melting", [], 10, 0);

    private static Telecommand Command() => new(new CommandAction(MissionIds.Probe, "pause_descent", []), "test", "ground", SimTime.Epoch);

    private static string Field(Records.JournalRecord record, string name) => record.Fields.Single(f => f.Name == name).Text!;

    private static double Number(Records.JournalRecord record, string name) => CollectingSink.Field(record, name);

    [Fact]
    public void A_plain_station_passes_a_frame_home_after_its_delay_and_the_light_time_and_a_command_down_after_its_delay()
    {
        var context = At(100);
        var state = StationRelay.OnFrame(Plain.Design, Plain.InitialState, Frame(1), context);
        state = StationRelay.OnCommand(Plain.Design, state, Command(), context);

        // Forwarding 2 s plus 1.08e12 m at 299 792 458 m/s (exact by the SI definition of the metre).
        var homeS = 2 + (1.08e12 / 299_792_458.0);
        Assert.Equal(1, state.FramesForwarded);
        Assert.Equal([MissionIds.Ground, MissionIds.Tether], context.Scheduled.Select(e => e.Target));
        Assert.Equal(SimTime.FromSecondsSinceEpoch(100 + homeS), context.Scheduled[0].Key.Time);
        Assert.Equal(SimTime.FromSecondsSinceEpoch(102), context.Scheduled[1].Key.Time);
        Assert.Empty(context.Records);
    }

    [Fact]
    public void A_dead_station_loses_frames_with_one_warning_per_run_of_frames_and_loses_commands_with_an_alarm()
    {
        var context = At(0);
        var state = Plain.InitialState with { Failed = true, FailureCause = "fault" };
        foreach (var sequence in new long[] { 4, 5, 9 }) state = StationRelay.OnFrame(Plain.Design, state, Frame(sequence), context);
        state = StationRelay.OnCommand(Plain.Design, state, Command(), context);

        Assert.Equal((3L, 1L), (state.FramesLost, state.CommandsLost));
        Assert.Empty(context.Scheduled);
        Assert.Equal(["warning", "info", "warning", "alarm"], context.Records.Select(r => r.Severity.ToString().ToLowerInvariant()));
        Assert.Equal("station failed", Field(context.Records[3], "where"));
    }

    [Fact]
    public void Out_of_view_a_frame_waits_and_the_transmitter_books_its_turn_at_the_next_frame_start_once()
    {
        var link = Windowed.Design.Link;
        var closedS = ClosedInstant(link);
        var context = At(closedS);
        var state = StationRelay.OnFrame(Windowed.Design, Windowed.InitialState, Frame(1), context);

        // The frame is ready after the 2 s of forwarding; it goes at the first instant after that when it fits whole.
        var turnS = link.NextFrameStartS(closedS + 2);
        Assert.True(turnS > closedS + 2);
        Assert.Equal(1, state.FramesQueued);
        var turn = Assert.Single(context.Scheduled);
        Assert.Equal(LinkService.Instance, turn.Payload);
        Assert.Equal(StationTransmitter.CeilingTick(turnS), turn.Key.Time);
        var waiting = Assert.Single(context.Records);
        Assert.Equal(("station.link_waiting", "home out of view"), (waiting.Kind, Field(waiting, "reason")));

        // A second frame joins the queue: the turn is booked already, and the wait is logged once.
        var second = At(closedS + 600);
        state = StationRelay.OnFrame(Windowed.Design, state, Frame(2), second);
        Assert.Equal(2, state.FramesQueued);
        Assert.Empty(second.Scheduled);
        Assert.Empty(second.Records);

        // A third finds the queue full (capacity 2): lost, with its cause.
        state = StationRelay.OnFrame(Windowed.Design, state, Frame(3), second);
        Assert.Equal((2, 1L), (state.FramesQueued, state.FramesLost));
        Assert.Equal("frame queue full", Field(Assert.Single(second.Records), "cause"));
    }

    [Fact]
    public void At_its_turn_the_transmitter_sends_the_oldest_frame_home_and_books_the_next_when_the_first_is_off_the_air()
    {
        var link = Windowed.Design.Link;
        var closedS = ClosedInstant(link);
        var queueing = At(closedS);
        var state = StationRelay.OnFrame(Windowed.Design, Windowed.InitialState, Frame(1), queueing);
        state = StationRelay.OnFrame(Windowed.Design, state, Frame(2), queueing);
        var turn = queueing.Scheduled.Single().Key.Time;

        var context = At(turn.SecondsSinceEpoch);
        var after = StationTransmitter.Pump(Windowed.Design, StationTransmitter.Serve(Windowed.Design, state with { PendingService = null }, context), context);

        Assert.Equal((1, 1L, null), (after.FramesQueued, after.FramesForwarded, after.WaitingSince));
        Assert.Equal(("station.link_resumed", turn.SecondsSinceEpoch - closedS), (context.Records[0].Kind, Number(context.Records[0], "waited_s")));
        // The frame reaches home after its time on the air plus the light time; the next turn comes when it is off the air.
        Assert.Equal(MissionIds.Ground, context.Scheduled[0].Target);
        Assert.Equal(turn + SimDuration.FromSeconds(link.FrameTimeS) + SimDuration.FromSeconds(Windowed.Design.OneWayLightTimeS), context.Scheduled[0].Key.Time);
        Assert.Equal(turn + SimDuration.FromSeconds(link.FrameTimeS), after.TransmitterFreeAt);
        Assert.Equal(LinkService.Instance, context.Scheduled[1].Payload);
        Assert.Equal(StationTransmitter.CeilingTick(link.NextFrameStartS(after.TransmitterFreeAt.SecondsSinceEpoch)), context.Scheduled[1].Key.Time);
    }

    [Fact]
    public void A_command_out_of_view_is_queued_with_the_opening_and_released_down_the_fibre_at_the_turn()
    {
        var link = Windowed.Design.Link;
        var closedS = ClosedInstant(link);
        var context = At(closedS);
        var state = StationRelay.OnCommand(Windowed.Design, Windowed.InitialState, Command(), context);

        var opensS = link.NextOpeningS(closedS);
        var queued = context.Records[0];
        Assert.Equal(("station.command_queued", opensS), (queued.Kind, Number(queued, "window_opens_t_s")));
        Assert.Equal(["station.command_queued", "station.link_waiting"], context.Records.Select(r => r.Kind));
        Assert.Equal(StationTransmitter.CeilingTick(opensS), context.Scheduled.Single().Key.Time);

        var turn = At(StationTransmitter.CeilingTick(opensS).SecondsSinceEpoch);
        var after = StationTransmitter.Serve(Windowed.Design, state with { PendingService = null }, turn);
        Assert.Equal(0, after.CommandsQueued);
        var released = turn.Records.Single(r => r.Kind == "station.command_released");
        Assert.Equal(turn.Now.SecondsSinceEpoch - closedS, Number(released, "held_s"), 6);
        Assert.Equal((MissionIds.Tether, turn.Now + SimDuration.FromSeconds(2)), (turn.Scheduled.Single().Target, turn.Scheduled.Single().Key.Time));
    }

    [Fact]
    public void An_upset_stops_the_transmitter_for_its_recovery_and_a_later_upset_within_it_extends_it()
    {
        var context = At(1000);
        var pending = At(0).ScheduleSelf(SimDuration.FromSeconds(5), LinkService.Instance);
        var state = StationLife.Upset(Charged.Design, Charged.InitialState with { PendingService = pending }, 3600, "discharge", context);

        Assert.Equal((1L, SimTime.FromSecondsSinceEpoch(4600), null), (state.Upsets, state.RecoveringUntil!.Value, state.PendingService));
        Assert.Equal([pending], context.Cancelled);
        Assert.Equal(new StationUpsetOver(SimTime.FromSecondsSinceEpoch(4600)), context.Scheduled.Single().Payload);
        Assert.Equal("lost", Field(context.Records.Single(), "arrivals"));

        // A frame arriving while it recovers is lost (the scenario says lose), with its cause.
        var during = At(2000);
        var lost = StationRelay.OnFrame(Charged.Design, state, Frame(7), during);
        Assert.Equal("station recovering from an upset", Field(during.Records.Single(), "cause"));
        Assert.Equal(1, lost.FramesLost);

        // A shorter upset inside the recovery keeps the later end; a longer one moves it.
        var shorter = StationLife.Upset(Charged.Design, state, 60, "discharge", At(2000));
        Assert.Equal(SimTime.FromSecondsSinceEpoch(4600), shorter.RecoveringUntil);
        var longer = StationLife.Upset(Charged.Design, state, 7200, "discharge", At(2000));
        Assert.Equal(SimTime.FromSecondsSinceEpoch(9200), longer.RecoveringUntil);
        Assert.Equal(2, longer.Upsets);
    }

    [Fact]
    public void Only_the_end_of_the_latest_recovery_ends_it()
    {
        var state = Charged.InitialState with { RecoveringUntil = SimTime.FromSecondsSinceEpoch(9200), Upsets = 2 };
        var stale = At(4600);
        Assert.Same(state, StationLife.RecoverFromUpset(Charged.Design, state, new StationUpsetOver(SimTime.FromSecondsSinceEpoch(4600)), stale));
        Assert.Empty(stale.Records);

        var due = At(9200);
        var over = StationLife.RecoverFromUpset(Charged.Design, state, new StationUpsetOver(SimTime.FromSecondsSinceEpoch(9200)), due);
        Assert.Null(over.RecoveringUntil);
        Assert.Equal("station.upset_recovered", due.Records.Single().Kind);
        Assert.Empty(due.Scheduled);
    }

    [Fact]
    public void A_failure_loses_what_waits_and_cancels_the_turn_and_a_cleared_fault_brings_the_station_back()
    {
        var link = Windowed.Design.Link;
        var queueing = At(ClosedInstant(link));
        var state = StationRelay.OnFrame(Windowed.Design, Windowed.InitialState, Frame(1), queueing);
        state = StationRelay.OnCommand(Windowed.Design, state, Command(), queueing);
        var turn = state.PendingService!.Value;

        var context = At(queueing.Now.SecondsSinceEpoch + 10);
        var dead = StationLife.FailByFault(Windowed.Design, state, "cut", context);
        Assert.True(dead.Failed);
        Assert.Equal((0, 0, 1L, 1L), (dead.FramesQueued, dead.CommandsQueued, dead.FramesLost, dead.CommandsLost));
        Assert.Equal([turn], context.Cancelled);
        Assert.Equal(["station.failed", "station.data_lost", "command.lost"], context.Records.Select(r => r.Kind));

        var again = At(20);
        Assert.Same(dead, StationLife.FailByFault(Windowed.Design, dead, "cut", again));
        Assert.Empty(again.Records);

        var back = StationLife.RecoverFromFault(Windowed.Design, dead, "cut", At(30));
        Assert.False(back.Failed);
        Assert.Null(back.FailureCause);
    }

    [Fact]
    public void The_dose_kills_the_station_at_the_drawn_failure_dose_for_good()
    {
        var station = new StationComponent(DoseScenario);
        var start = At(0);
        StationStart.Start(station.Design, start);
        var radiation = start.Records.Single(r => r.Kind == "station.radiation");
        // The limit is booked at the drawn dose over the electronics' dose rate, from the same stream a run uses.
        var drawn = station.Dose!.DrawFailureDoseGy(new RandomStream(1, MissionIds.Station));
        Assert.Equal(drawn, Number(radiation, "failure_dose_gy_si"));
        var limit = start.Scheduled.Single(e => e.Payload is StationDoseLimit);
        Assert.Equal(SimTime.FromSecondsSinceEpoch(drawn / station.Dose.SiliconDoseRateGyPerS), limit.Key.Time, new TickTolerance(1));

        var at = At(limit.Key.Time.SecondsSinceEpoch);
        var dead = StationLife.DieOfDose(station.Design, station.InitialState, (StationDoseLimit)limit.Payload, at);
        Assert.Equal("dose", dead.FailureCause);
        Assert.Equal(drawn, Number(at.Records.Single(), "dose_gy_si"), 9);
        // A station_failure fault that clears later does not bring a station killed by its dose back.
        Assert.Same(dead, StationLife.RecoverFromFault(station.Design, dead, "cut", At(limit.Key.Time.SecondsSinceEpoch + 1)));
    }

    [Fact]
    public void The_end_of_the_dwell_clears_the_probe_to_descend_with_the_log_reduction_of_the_surface_dose()
    {
        var scenario = TestScenario.BuiltIn("station-dies-before-breakthrough.yaml")
            .InsertBefore("  link:\n", "  dwell:\n    duration: 10 d\n    d_value: 2 Gy\n").Load();
        var station = new StationComponent(scenario);
        var context = At(10 * 86_400.0);
        StationDwell.End(station.Design, context);

        // 5 Gy/d unshielded for 10 d is 50 Gy; at a D-value of 2 Gy that is 25 log reductions (the D10 value is the dose of
        // one log reduction, as ISO 11137-2 defines it, so the reduction is dose over D-value).
        var ended = context.Records.Single();
        Assert.Equal((50.0, 25.0), (Number(ended, "exposed_dose_gy"), Number(ended, "log_reduction")), new PairTolerance(1e-9));
        var cleared = (DescentCleared)context.Scheduled.Single(e => e.Target == MissionIds.Probe).Payload;
        Assert.Equal(25.0, cleared.LogReduction, 9);
    }

    [Fact]
    public void A_lander_station_hands_frames_to_the_shared_link_home_and_tells_it_of_its_death()
    {
        var station = new StationComponent(TestScenario.Default.Load(), LanderIds.For("north"));
        var context = At(50);
        StationRelay.OnFrame(station.Design, station.InitialState, Frame(1), context);
        var bound = Assert.IsType<HomeBound>(context.Scheduled.Single().Payload);
        Assert.Equal(("north", MissionIds.LinkHome, SimTime.FromSecondsSinceEpoch(52)), (bound.Lander, context.Scheduled[0].Target, context.Scheduled[0].Key.Time));

        var dying = At(60);
        StationLife.FailByFault(station.Design, station.InitialState, "cut", dying);
        Assert.Equal(new StationDown("north"), dying.Scheduled.Single().Payload);
    }

    [Fact]
    public void The_ground_hears_the_carrier_go_and_come_back_a_light_time_later_only_when_it_listens()
    {
        var listened = new StationComponent(TestScenario.Default.Load(), reportsCarrier: true);
        var context = At(1000);
        var dead = StationLife.FailByFault(listened.Design, listened.InitialState, "cut", context);
        StationBeacon.Report(listened.Design, listened.InitialState, dead, context);
        var lost = context.Scheduled.Single(e => e.Payload is StationCarrier);
        Assert.Equal((MissionIds.Ground, new StationCarrier(false)), (lost.Target, lost.Payload));
        Assert.Equal(SimTime.FromSecondsSinceEpoch(1000) + SimDuration.FromSeconds(1.08e12 / 299_792_458.0), lost.Key.Time);

        // A reset silences the carrier as death does; its end brings it back.
        var upset = At(2000);
        var resetting = StationLife.Upset(listened.Design, listened.InitialState, 60, "discharge", upset);
        StationBeacon.Report(listened.Design, listened.InitialState, resetting, upset);
        Assert.Contains(upset.Scheduled, e => e.Payload is StationCarrier { On: false });
        var over = At(2060);
        var back = StationLife.RecoverFromUpset(listened.Design, resetting, new StationUpsetOver(resetting.RecoveringUntil!.Value), over);
        StationBeacon.Report(listened.Design, resetting, back, over);
        Assert.Contains(over.Scheduled, e => e.Payload is StationCarrier { On: true });

        // Nobody listening (the default), nothing is sent.
        var quiet = At(1000);
        StationBeacon.Report(Plain.Design, Plain.InitialState, StationLife.FailByFault(Plain.Design, Plain.InitialState, "cut", quiet), quiet);
        Assert.DoesNotContain(quiet.Scheduled, e => e.Payload is StationCarrier);
    }

    [Fact]
    public void An_instant_read_back_from_a_tick_stays_on_that_tick_and_any_other_goes_up_to_the_next()
    {
        Assert.Equal(new SimTime(1_000_000), StationTransmitter.CeilingTick(1.0));
        Assert.Equal(new SimTime(1_000_000), StationTransmitter.CeilingTick(1.0 + 4e-10));
        Assert.Equal(new SimTime(1_000_001), StationTransmitter.CeilingTick(1.0 + 2e-7));
    }

    /// <summary>An instant in the middle of the first closed stretch of the design's windows.</summary>
    private static double ClosedInstant(HomeLink link)
    {
        var closesS = link.ClosingS(link.NextOpeningS(0));
        var reopensS = link.NextOpeningS(closesS + 1);
        Assert.False(link.IsOpen((closesS + reopensS) / 2));
        return (closesS + reopensS) / 2;
    }

    private sealed class TickTolerance(long ticks) : IEqualityComparer<SimTime>
    {
        public bool Equals(SimTime x, SimTime y) => Math.Abs(x.Ticks - y.Ticks) <= ticks;

        public int GetHashCode(SimTime obj) => 0;
    }

    private sealed class PairTolerance(double tolerance) : IEqualityComparer<(double, double)>
    {
        public bool Equals((double, double) x, (double, double) y) => Math.Abs(x.Item1 - y.Item1) <= tolerance && Math.Abs(x.Item2 - y.Item2) <= tolerance;

        public int GetHashCode((double, double) obj) => 0;
    }
}
