using DescentOps.Engine.Running;
using DescentOps.Mission.Probe;
using DescentOps.Mission.Station;
using DescentOps.Physics.Descent;

namespace DescentOps.Mission.Tests;

/// <summary>What the first end-to-end mission does, checked against values computed outside the simulation.</summary>
public sealed class MissionBehaviourTests
{
    private static readonly (string, string) NoFaults = ("faults:\n  - name: bus-sag-day-30\n    kind: power_dip\n    at: 30 d\n    duration: 12 h\n    remaining_fraction: 0.4\n", "");

    [Fact]
    public async Task TheCrossingTimeIsTheIntegralOfOneOverTheMeltRate()
    {
        var scenario = MissionHarness.Edited(NoFaults);
        var (summary, _) = await MissionHarness.RunAsync(scenario);

        // Computed reference: t = ∫0^H dz / v(z) by the midpoint rule on 20,000 slices, with the same
        // melt-rate and shell formulas. It checks the event-driven integration and the crossing event,
        // not the physics (the physics issue checks that against published values).
        var shell = new ShellThermalProfile(scenario.Shell, scenario.Body.GravityMPerS2);
        const int slices = 20_000;
        var dz = scenario.Shell.ThicknessM / slices;
        var expected = 0.0;
        for (var i = 0; i < slices; i++)
        {
            var z = (i + 0.5) * dz;
            expected += dz / IdealMeltRate.VelocityMPerS(scenario.Probe.HeadPowerW, scenario.Probe.RadiusM, shell.TemperatureAtK(z), shell.MeltingTemperatureAtK(z), scenario.Probe.HeadEfficiency);
        }

        // The simulator holds velocity constant over each 10-minute frame interval (a left Riemann sum in
        // time); over ~150 days that lags by well under 0.1 %.
        Assert.Equal(RunOutcomeKind.Completed, summary.Outcome.Kind);
        Assert.InRange(summary.BreakthroughTimeS!.Value / expected, 0.999, 1.001);
        Assert.Equal(scenario.Shell.ThicknessM, summary.FinalDepthM, 9);
    }

    [Fact]
    public async Task EnergyUsedToBreakthroughIsBusPowerTimesTime()
    {
        var scenario = MissionHarness.Edited(NoFaults);
        var (_, sink) = await MissionHarness.RunAsync(scenario);
        var breakthrough = sink.OfKind("probe.breakthrough").Single();

        // Computed: with no fault the bus draws head + wall + electronics power all the way down.
        var busW = scenario.Probe.HeadPowerW + scenario.Probe.WallPowerW + scenario.Probe.ElectronicsPowerW;
        var expected = busW * breakthrough.Time.SecondsSinceEpoch;
        Assert.Equal(expected, CollectingSink.Field(breakthrough, "energy_used_j"), expected * 1e-9);
    }

    [Fact]
    public async Task APowerDipDelaysBreakthroughByTheDistanceItCost()
    {
        var nominal = MissionHarness.Edited(NoFaults);
        var dipped = BuiltInScenarios();
        var (nominalSummary, _) = await MissionHarness.RunAsync(nominal);
        var (dippedSummary, dippedSink) = await MissionHarness.RunAsync(dipped);

        // Computed: during the dip the probe melts at f·v instead of v for a duration D, so it ends the dip
        // (1 − f)·v·D short of the nominal probe. After that both move through the same velocity field v(z),
        // so the dipped probe stays behind by the time the nominal one took over that distance, (1 − f)·D,
        // to first order (v barely changes over the few metres lost).
        var dip = dipped.Faults[0];
        var expectedDelay = (1 - dip.RemainingFraction) * dip.DurationS!.Value;
        Assert.Single(dippedSink.OfKind("fault.injected"));

        var delay = dippedSummary.BreakthroughTimeS!.Value - nominalSummary.BreakthroughTimeS!.Value;
        Assert.InRange(delay / expectedDelay, 0.99, 1.01);
    }

    [Fact]
    public async Task GroundLatencyIsFibrePlusStationPlusLightTime()
    {
        var scenario = DescentOps.Scenarios.BuiltInScenarios.Default();
        var (_, sink) = await MissionHarness.RunAsync(scenario);
        var frame = sink.OfKind("ground.telemetry").First(r => CollectingSink.IntegerField(r, "frame") == 1000);

        // Computed: depth / fibre signal speed + station forwarding delay + distance / c (c exact by SI).
        var expected = (CollectingSink.Field(frame, "depth_m") / scenario.Tether.SignalSpeedMPerS)
                       + scenario.Station.ForwardingDelayS
                       + (scenario.Body.DistanceToGroundM / StationComponent.SpeedOfLightMPerS);
        // Each of the three delays is rounded to the 1 µs tick.
        Assert.Equal(expected, CollectingSink.Field(frame, "latency_s"), 3e-6);
    }

    [Fact]
    public async Task ABrokenTetherLosesEveryLaterFrameAndSaysSo()
    {
        var scenario = MissionHarness.Edited(("run:\n", "  - name: fibre-shear\n    kind: tether_break\n    at: 60 d\nrun:\n"));
        var (summary, sink) = await MissionHarness.RunAsync(scenario);

        var broken = sink.OfKind("tether.broken").Single();
        Assert.Equal(60 * 86400.0, broken.Time.SecondsSinceEpoch, 6);
        var framesAfter = sink.OfKind("probe.telemetry").Count(r => r.Time >= broken.Time);
        Assert.Equal(framesAfter, sink.OfKind("tether.frame_lost").Count());
        Assert.Equal(framesAfter, summary.FramesLost);
        Assert.Equal(RunOutcomeKind.Completed, summary.Outcome.Kind);
    }

    [Fact]
    public async Task AStationOutageShowsOnTheGroundAsAGapOfTheLostFrames()
    {
        var scenario = MissionHarness.Edited(("run:\n", "  - name: station-brownout\n    kind: station_failure\n    at: 100 d\n    duration: 2 d\nrun:\n"));
        var (_, sink) = await MissionHarness.RunAsync(scenario);

        var lost = sink.OfKind("station.frame_lost").Count();
        // Computed: a 2-day outage at one frame per 10 minutes drops 2 × 86400 / 600 = 288 frames (±1 at the edges).
        Assert.InRange(lost, 287, 289);
        var gap = sink.OfKind("ground.gap").Single();
        Assert.Equal(lost, CollectingSink.IntegerField(gap, "missing"));
    }

    private static Scenarios.Model.Scenario BuiltInScenarios() => DescentOps.Scenarios.BuiltInScenarios.Default();
}
