using DescentOps.Engine.Components;
using DescentOps.Engine.Randomness;
using DescentOps.Mission.Messages;
using DescentOps.Mission.Tether;
using DescentOps.Primitives.Time;
using DescentOps.Rules.Compiled;
using DescentOps.Scenarios;
using DescentOps.Scenarios.Model;

namespace DescentOps.Mission.Tests.TetherParts;

/// <summary>
/// The link's parts, one transition at a time, on a detached context, with the built-in relay scenario's figures
/// (3.2 km of fibre at 2.04e8 m/s, 144-frame buffers, 8 relays every 500 m with 5 kWh at 1 W).
/// </summary>
public sealed class TetherTransitionTests
{
    private static readonly Scenario Relays = Load("tether-break-relays.yaml");
    private static readonly TetherComponent Component = new(Relays);
    private static readonly TetherDesign Design = Component.Design;

    private static Scenario Load(string name) => DescentOps.Scenarios.Loading.ScenarioLoader.LoadText(BuiltInScenarios.Text(name), name);

    private static ComponentContext At(double seconds) =>
        ComponentContext.Detached(MissionIds.Tether, new RandomStream(1, MissionIds.Tether), SimTime.FromSecondsSinceEpoch(seconds));

    private static TelemetryFrame Frame(long sequence, double depthM) => new(sequence, SimTime.Epoch, "Melting", [], depthM, 0);

    [Fact]
    public void The_fibre_pays_out_with_a_record_every_tenth_of_the_spool_and_parts_past_its_end()
    {
        var context = At(0);
        // A tenth of 3.2 km is 320 m.
        var at300 = TetherFibre.PayOut(Design, Component.InitialState, 300, context);
        Assert.Empty(context.Records);
        var at400 = TetherFibre.PayOut(Design, at300, 400, context);
        Assert.Equal(("tether.payout", 1), (Assert.Single(context.Records).Kind, at400.PayoutMilestone));

        var end = At(0);
        var broken = TetherFibre.PayOut(Design, at400, 3300, end);
        Assert.True(broken.Broken);
        Assert.Equal((3200.0, 3200.0, false), (broken.PaidOutM, broken.BrokenAtDepthM!.Value, broken.FibreUp));
        Assert.Equal("the spool ran out of fibre", Assert.Single(end.Records).Fields.Single(f => f.Name == "cause").Text);
    }

    [Fact]
    public void Relays_go_in_as_the_head_passes_their_depths_each_with_its_battery_timer()
    {
        var context = At(100);
        var state = RelayDrops.DropPlanned(Design, Component.InitialState with { ProbeDepthM = 1200 }, context);

        Assert.Equal([(1, 500.0), (2, 1000.0)], state.Relays.Select(r => (r.Number, r.DepthM)));
        Assert.Equal(2, state.NextPlannedDrop);
        // 5 kWh at 1 W: 1.8e7 s.
        Assert.All(context.Scheduled, e => Assert.Equal(SimTime.FromSecondsSinceEpoch(100 + 1.8e7), e.Key.Time));
        Assert.Equal([new RelayBatteryDue(1), new RelayBatteryDue(2)], context.Scheduled.Select(e => e.Payload));
    }

    [Fact]
    public void A_drop_with_none_left_is_refused_and_logged()
    {
        var context = At(0);
        var none = WithoutRelays().Design;
        var state = RelayDrops.Drop(none, Component.InitialState, 100, "test", context);
        Assert.Empty(state.Relays);
        Assert.Equal("relay.none_left", Assert.Single(context.Records).Kind);
    }

    [Fact]
    public void A_relay_whose_battery_goes_flat_loses_what_it_held()
    {
        var hold = new FrameHold<TelemetryFrame>(144).Offer(Frame(7, 600))!.Offer(Frame(8, 600))!;
        var state = Component.InitialState with { Relays = [new RelayState(1, 500, SimTime.Epoch, false, hold)] };
        var context = At(0);
        var after = RelayDrops.BatteryFlat(state, 1, context);

        Assert.True(after.Relays[0].Dead);
        Assert.Equal(0, after.Relays[0].Hold.Count);
        Assert.Equal(2, after.FramesLost);
        Assert.Equal(["data.lost", "data.lost", "relay.battery_flat"], context.Records.Select(r => r.Kind));
    }

    [Fact]
    public void A_relay_fault_silences_its_relay_until_it_clears()
    {
        var failed = RelayDrops.Fault(Component.InitialState, "quiet", 3, true, At(0));
        Assert.Equal([3], failed.FailedRelays);
        Assert.Empty(RelayDrops.Fault(failed, "quiet", 3, false, At(0)).FailedRelays);
    }

    [Fact]
    public void While_the_fibre_is_up_a_frame_goes_to_the_station_after_the_light_time_of_the_paid_out_fibre()
    {
        var context = At(0);
        var state = TetherRouting.Route(Design, Component.InitialState with { PaidOutM = 2040 }, Frame(1, 2040), context);

        // 2040 m at 2.04e8 m/s: 10 µs.
        var sent = Assert.Single(context.Scheduled);
        Assert.Equal((MissionIds.Station, SimTime.Epoch + new SimDuration(10)), (sent.Target, sent.Key.Time));
        Assert.Equal(1, state.FramesCarried);
    }

    [Fact]
    public void With_the_fibre_broken_and_no_radio_path_a_frame_waits_in_the_probe_buffer_and_the_probe_hears_of_the_fill()
    {
        // At 2.4 km (the shell is 2.5 km) without relays the probe's own radio cannot reach the surface.
        var broken = Component.InitialState with { Broken = true, FibreUp = false, ProbeDepthM = 2400, PaidOutM = 2400 };
        Assert.False(RelayChain.Of(Design, broken).PathUp);
        var context = At(0);
        var state = TetherReports.Report(Design, TetherRouting.Route(Design, broken, Frame(1, 2400), context), context);

        Assert.Equal(1, state.ProbeHold.Count);
        Assert.Equal(1.0 / 144, state.ReportedFill, 15);
        Assert.Contains(context.Scheduled, e => e.Payload is LinkBufferFill { Fraction: var f } && Math.Abs(f - (1.0 / 144)) < 1e-15);
        Assert.Contains(context.Scheduled, e => e.Payload is LinkPathChanged { Path: LinkPaths.None });
    }

    [Fact]
    public void A_command_with_no_way_down_waits_at_the_surface_or_is_lost_without_a_buffer()
    {
        var command = new Telecommand(new CommandAction(MissionIds.Probe, "pause_descent", []), "test", "ground", SimTime.Epoch);
        var broken = Component.InitialState with { Broken = true, FibreUp = false, ProbeDepthM = 2400 };
        var held = TetherRouting.CarryDown(Design, broken, command, At(0));
        Assert.Equal(1, held.CommandHold.Count);

        var context = At(0);
        var unbuffered = broken with { CommandHold = new FrameHold<Telecommand>(0) };
        TetherRouting.CarryDown(Design, unbuffered, command, context);
        Assert.Equal("tether broken, no relay path and no buffer", Assert.Single(context.Records).Fields.Single(f => f.Name == "cause").Text);
    }

    private static TetherComponent WithoutRelays() => new(Relays with { Relays = null });
}
