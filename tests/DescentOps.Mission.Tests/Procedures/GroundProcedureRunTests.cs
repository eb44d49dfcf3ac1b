using DescentOps.Primitives.Time;
using DescentOps.Records;
using DescentOps.Records.Kinds;
using DescentOps.Tests.Shared;

namespace DescentOps.Mission.Tests.Procedures;

/// <summary>
/// The built-in ground-frees-stalled-probe scenario: a bus trip on day 1 freezes the probe in, no on-board rule acts,
/// and the ground's procedure frees it from home. Every step's timing is checked against the link delays computed
/// here from the scenario's figures: the ground sees a frame one downlink after it was sampled and its commands reach
/// the probe one uplink after they leave.
/// </summary>
public sealed class GroundProcedureRunTests
{
    private const string Name = "ground-frees-stalled-probe.yaml";

    // From the scenario: distance home 1.08e9 km, station forwarding 2 s, fibre signal speed 2.04e8 m/s, frames every 10 min.
    private static readonly SimDuration Light = SimDuration.FromSeconds(1.08e12 / 299_792_458.0); // CODATA c = 299,792,458 m/s: 3602.4923 s
    private static readonly SimDuration Forwarding = SimDuration.FromSeconds(2.0);
    private const double FibreSpeedMPerS = 2.04e8;
    private const double FrameIntervalS = 600;

    private static async Task<CollectingSink> RunAsync() => (await RunWithSummaryAsync()).Sink;

    private static async Task<(Running.MissionSummary Summary, CollectingSink Sink)> RunWithSummaryAsync() =>
        await MissionHarness.RunAsync(TestScenario.BuiltIn(Name).Set("run.until", "2 d").Load());

    [Fact]
    public async Task The_procedures_first_command_is_the_first_action_on_the_fault_its_rule_detected()
    {
        var (summary, sink) = await RunWithSummaryAsync();
        var measure = Assert.Single(summary.Faults);
        var executed = Assert.Single(sink.OfKind(CommandRecords.Executed), r => CollectingSink.TextField(r, "origin") == "procedure free-frozen-probe, step boost-wall");
        // The fault starts at 1 d (86,400 s); the rule that detects the freeze started the procedure, whose boost is its action.
        Assert.Equal(executed.Time.SecondsSinceEpoch - 86_400, measure.FirstActionAfterS!.Value, 6);
    }

    /// <summary>The fibre leg at the depth the probe reported at <paramref name="at"/> (it pays out what it descends).</summary>
    private static SimDuration Fibre(CollectingSink sink, SimTime at) =>
        SimDuration.FromSeconds(CollectingSink.Field(sink.OfKind(ProbeRecords.Telemetry).Last(r => r.Time <= at), "depth_m") / FibreSpeedMPerS);

    /// <summary>The first frame instant at or after <paramref name="time"/> (frames are sampled on the 10-min grid from 0).</summary>
    private static SimTime NextFrame(SimTime time) => SimTime.FromSecondsSinceEpoch(Math.Ceiling(time.SecondsSinceEpoch / FrameIntervalS) * FrameIntervalS);

    private static JournalRecord Step(CollectingSink sink, string kind, string step) =>
        Assert.Single(sink.OfKind(kind), r => CollectingSink.TextField(r, "step") == step);

    [Fact]
    public async Task The_ground_procedure_frees_the_frozen_probe_with_every_step_one_link_delay_late()
    {
        var sink = await RunAsync();

        // The first frame that shows the freeze, sampled on board, reaches the ground one downlink later; the rule starts the procedure then.
        var frozenFrame = sink.OfKind(ProbeRecords.Telemetry).First(r => CollectingSink.TextField(r, "regime") == "FrozenIn").Time;
        var started = Assert.Single(sink.OfKind(ProcedureRecords.Started));
        Assert.Equal(frozenFrame + Fibre(sink, frozenFrame) + Forwarding + Light, started.Time);
        Assert.Equal("frozen-in-seen", CollectingSink.TextField(started, "by"));

        // Step 1 sends the wall boost at once; it reaches the probe one uplink later.
        var boost = Step(sink, ProcedureRecords.StepStarted, "boost-wall");
        Assert.Equal(started.Time, boost.Time);
        var executed = Assert.Single(sink.OfKind(CommandRecords.Executed), r => CollectingSink.TextField(r, "origin") == "procedure free-frozen-probe, step boost-wall");
        var uplinkLanded = boost.Time + Light + Forwarding;
        Assert.Equal(uplinkLanded + Fibre(sink, uplinkLanded), executed.Time);

        // The first frame sampled after that shows 14 kW; the step passes when it reaches the ground.
        var boostFrame = NextFrame(executed.Time);
        var boostPassed = Step(sink, ProcedureRecords.StepPassed, "boost-wall");
        Assert.Equal(boostFrame + Fibre(sink, boostFrame) + Forwarding + Light, boostPassed.Time);
        Assert.Equal((boostPassed.Time - boost.Time).TotalSeconds, CollectingSink.Field(boostPassed, "took_s"), 6);
        Assert.Equal($"probe.wall_power=14000@{boostFrame.SecondsSinceEpoch}s", CollectingSink.TextField(boostPassed, "evidence"));

        // Step 2 waits for melting, on frames that reach the ground after it started: the first one sampled after the boost's frame.
        // (The nominal heat has freed the probe before the boost arrived: a one-hour freeze is shorter than the round trip.)
        var melting = Step(sink, ProcedureRecords.StepPassed, "await-melting");
        var meltingFrame = sink.OfKind(ProbeRecords.Telemetry).First(r => r.Time > boostFrame && CollectingSink.TextField(r, "regime") == "Melting").Time;
        Assert.Equal(boostFrame + SimDuration.FromSeconds(FrameIntervalS), meltingFrame);
        Assert.Equal(meltingFrame + Fibre(sink, meltingFrame) + Forwarding + Light, melting.Time);
        var nominal = Step(sink, ProcedureRecords.StepStarted, "wall-to-nominal");
        Assert.Equal(melting.Time, nominal.Time);
        var nominalExecuted = Assert.Single(sink.OfKind(CommandRecords.Executed), r => CollectingSink.TextField(r, "origin") == "procedure free-frozen-probe, step wall-to-nominal");
        var nominalFrame = NextFrame(nominalExecuted.Time);
        var nominalPassed = Step(sink, ProcedureRecords.StepPassed, "wall-to-nominal");
        Assert.Equal(nominalFrame + Fibre(sink, nominalFrame) + Forwarding + Light, nominalPassed.Time);
        Assert.Contains($"probe.regime=Melting@{nominalFrame.SecondsSinceEpoch}s", CollectingSink.TextField(nominalPassed, "evidence"), StringComparison.Ordinal);

        var finished = Assert.Single(sink.OfKind(ProcedureRecords.Finished));
        Assert.Equal(("done", nominalPassed.Time), (CollectingSink.TextField(finished, "outcome"), finished.Time));
        Assert.Empty(sink.OfKind(ProcedureRecords.StepFailed));
        Assert.Empty(sink.OfKind(ProcedureRecords.StepLate));
    }

    [Fact]
    public async Task A_step_given_less_time_than_the_round_trip_is_late_and_the_procedure_falls_back_to_safe_mode()
    {
        // The round trip alone is two light times, over 7205 s: a 55 min limit on the boost cannot be met from the ground.
        var scenario = TestScenario.BuiltIn(Name).Set("run.until", "2 d")
            .Replace("        wait_for: probe.wall_power above 13 kW\n        within: 3 h", "        wait_for: probe.wall_power above 13 kW\n        within: 55 min").Load();
        var sink = (await MissionHarness.RunAsync(scenario)).Sink;

        var boost = Step(sink, ProcedureRecords.StepStarted, "boost-wall");
        var late = Step(sink, ProcedureRecords.StepLate, "boost-wall");
        var deadline = boost.Time + SimDuration.FromSeconds(55 * 60);
        Assert.Equal(deadline, late.Time);
        Assert.Equal("safe-mode", CollectingSink.TextField(late, "next"));

        // The evidence is the last frame that reached the ground by then: sampled one downlink (fibre, station, light) before it at the latest.
        var downlink = Light + Forwarding + Fibre(sink, deadline);
        var lastFrame = SimTime.FromSecondsSinceEpoch(Math.Floor((deadline - downlink).SecondsSinceEpoch / FrameIntervalS) * FrameIntervalS);
        var seen = sink.OfKind(ProbeRecords.Telemetry).Single(r => r.Time == lastFrame);
        Assert.Equal($"probe.wall_power={CollectingSink.Field(seen, "wall_power_w")}@{lastFrame.SecondsSinceEpoch}s", CollectingSink.TextField(late, "evidence"));
        Assert.Single(sink.OfKind(CommandRecords.Executed), r => CollectingSink.TextField(r, "origin") == "procedure free-frozen-probe, step safe-mode");
        Assert.Equal("aborted", CollectingSink.TextField(Assert.Single(sink.OfKind(ProcedureRecords.Finished)), "outcome"));
    }
}
