using DescentOps.Scenarios.Model;
using DescentOps.Engine.Running;
using DescentOps.Mission.Probe;
using DescentOps.Mission.Station;

namespace DescentOps.Mission.Tests;

/// <summary>What the first end-to-end mission does, checked against values computed outside the simulation.</summary>
public sealed class MissionBehaviourTests
{
    private static readonly (string, string) NoFaults = ("faults:\n  - name: bus-sag-day-30\n    kind: power_dip\n    at: 30 d\n    duration: 12 h\n    remaining_fraction: 0.7\n", "");

    [Fact]
    public async Task The_crossing_time_is_the_integral_of_one_over_the_descent_rate()
    {
        var scenario = MissionHarness.Edited(NoFaults);
        var (summary, _) = await MissionHarness.RunAsync(scenario);

        // Computed reference: t = ∫0^H dz / v(z) by the midpoint rule on 20,000 slices, with the descent
        // model the probe runs on. It checks the event-driven integration and the two crossing events (end of
        // sublimation, breakthrough), not the physics (the physics tests check that against published values).
        var model = new ProbeComponent(scenario).Descent;
        const int slices = 20_000;
        var dz = scenario.Shell.ThicknessM / slices;
        var expected = 0.0;
        for (var i = 0; i < slices; i++)
        {
            expected += dz / model.Rate((i + 0.5) * dz, scenario.Probe.HeadPowerW, scenario.Probe.WallPowerW).VelocityMPerS;
        }

        // The simulator holds velocity constant over each 10-minute frame interval (a left Riemann sum in
        // time); over ~110 days that lags by well under 0.1 %.
        Assert.Equal(RunOutcomeKind.Completed, summary.Outcome.Kind);
        Assert.InRange(summary.BreakthroughTimeS!.Value / expected, 0.999, 1.001);
        Assert.Equal(scenario.Shell.ThicknessM, summary.FinalDepthM, 9);
    }

    [Fact]
    public async Task Energy_used_to_breakthrough_is_bus_power_times_time()
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
    public async Task A_power_dip_delays_breakthrough_by_the_distance_it_cost()
    {
        var nominal = MissionHarness.Edited(NoFaults);
        var dipped = BuiltInScenarios();
        var (nominalSummary, _) = await MissionHarness.RunAsync(nominal);
        var (dippedSummary, dippedSink) = await MissionHarness.RunAsync(dipped);

        // Computed: during the dip the probe moves at v_dip instead of v for a duration D, so it ends the
        // dip (v − v_dip)·D short of the nominal probe. After that both move through the same velocity field
        // v(z), so the dipped probe stays behind by the time the nominal one took over that distance,
        // D·(1 − v_dip/v), to first order (v barely changes over the metres lost).
        var dip = dipped.Faults[0];
        var dipAtS = Assert.IsType<FaultStart.AtTime>(dip.Start).AtS;
        var remaining = Assert.IsType<FaultEffect.PowerDip>(dip.Effect).RemainingFraction;
        var model = new ProbeComponent(dipped).Descent;
        var depthAtDip = CollectingSink.Field(dippedSink.OfKind("probe.telemetry").Last(r => r.Time.SecondsSinceEpoch <= dipAtS), "depth_m");
        var v = model.Rate(depthAtDip, dipped.Probe.HeadPowerW, dipped.Probe.WallPowerW).VelocityMPerS;
        var vDip = model.Rate(depthAtDip, dipped.Probe.HeadPowerW * remaining, dipped.Probe.WallPowerW * remaining).VelocityMPerS;
        var expectedDelay = dip.DurationS!.Value * (1 - (vDip / v));
        Assert.Single(dippedSink.OfKind("fault.injected"));

        var delay = dippedSummary.BreakthroughTimeS!.Value - nominalSummary.BreakthroughTimeS!.Value;
        Assert.InRange(delay / expectedDelay, 0.99, 1.01);
    }

    [Fact]
    public async Task A_probe_without_power_freezes_in_after_the_Stefan_time_and_melts_free_when_power_returns()
    {
        var scenario = MissionHarness.Edited(
            ("    remaining_fraction: 0.7\n", "    remaining_fraction: 0\n"),
            ("    duration: 12 h\n", "    duration: 2 h\n"));
        var (summary, sink) = await MissionHarness.RunAsync(scenario);

        var refreezing = sink.OfKind("probe.refreezing").Single();
        var frozen = sink.OfKind("probe.regime").Single(r => r.Fields.Any(f => f.Name == "to" && f.Text == "FrozenIn"));
        // Computed: the freeze-in instant is the stop plus the Stefan freeze time the probe reported, to the tick.
        Assert.Equal(refreezing.Time.SecondsSinceEpoch + CollectingSink.Field(refreezing, "freeze_time_s"), frozen.Time.SecondsSinceEpoch, 1e-5);
        var meltingFree = sink.OfKind("probe.melting_free").Single();
        Assert.Equal(Assert.IsType<FaultStart.AtTime>(scenario.Faults[0].Start).AtS + scenario.Faults[0].DurationS!.Value, meltingFree.Time.SecondsSinceEpoch, 1e-6);
        var resumed = sink.OfKind("probe.regime").Single(r => r.Fields.Any(f => f.Name == "from" && f.Text == "MeltingFree"));
        Assert.Equal(meltingFree.Time.SecondsSinceEpoch + CollectingSink.Field(meltingFree, "time_s"), resumed.Time.SecondsSinceEpoch, 1e-5);
        Assert.Equal(RunOutcomeKind.Completed, summary.Outcome.Kind);
    }

    [Fact]
    public async Task Wall_heaters_too_weak_to_melt_free_leave_the_probe_held_by_the_ice()
    {
        // Head and wall heat together (6.3 kW) would melt the frozen gap open, but 0.3 kW of wall heat is far below
        // the some 8 kW the side balance needs for a moving 2.4 m probe of 12 cm radius in this cold ice (issue 12):
        // the gap would close again at once, so the probe does not try and says it cannot melt free.
        var scenario = MissionHarness.Edited(
            ("    remaining_fraction: 0.7\n", "    remaining_fraction: 0\n"),
            ("  wall_power: 10 kW", "  wall_power: 0.3 kW"));
        var (summary, sink) = await MissionHarness.RunAsync(scenario);

        var cannot = Assert.Single(sink.OfKind("probe.cannot_melt_free"));
        Assert.True(CollectingSink.Field(cannot, "side_heat_supplied_w") < CollectingSink.Field(cannot, "required_side_heat_w"));
        Assert.Equal(RunOutcomeKind.TimeLimit, summary.Outcome.Kind);
        Assert.Null(summary.BreakthroughTimeS);
    }

    [Fact]
    public async Task Overlapping_power_dips_leave_the_smallest_share_until_the_last_one_ends()
    {
        // Day 30-30.5 at 70 % (the default's dip) and day 30.25-31 at 85 %: full power must not return at day 30.5.
        var scenario = MissionHarness.Edited(("run:\n", "  - name: long-sag\n    kind: power_dip\n    at: 30.25 d\n    duration: 0.75 d\n    remaining_fraction: 0.85\nrun:\n"));
        var (_, sink) = await MissionHarness.RunAsync(scenario);
        double HeadAt(double days) => CollectingSink.Field(sink.OfKind("probe.telemetry").First(r => r.Time.SecondsSinceEpoch >= days * 86400), "head_power_w");

        // Computed: head 6 kW × share in force (min of the dips active).
        Assert.Equal(6000 * 0.7, HeadAt(30.3), 6);
        Assert.Equal(6000 * 0.85, HeadAt(30.6), 6);
        Assert.Equal(6000.0, HeadAt(31.1), 6);
    }

    [Fact]
    public async Task A_stuck_sensor_repeats_the_true_reading_of_the_instant_it_stuck()
    {
        // Stuck between two frames (at day 10 plus 5 minutes): the reading it keeps is the depth at that instant.
        var scenario = MissionHarness.Edited(("run:\n", "  - name: depth-stuck\n    kind: sensor_stuck\n    at: 864300 s\n    point: probe.depth\nrun:\n"));
        var (_, sink) = await MissionHarness.RunAsync(scenario);
        var stuck = sink.OfKind("probe.sensor_fault").Single();
        var before = sink.OfKind("probe.telemetry").Last(r => r.Time < stuck.Time);
        var after = sink.OfKind("probe.telemetry").First(r => r.Time > stuck.Time);
        var truth = CollectingSink.Field(stuck, "true_value");
        // Computed: depth moves linearly between the frames at constant velocity, so the truth lies strictly between them.
        Assert.InRange(truth, CollectingSink.Field(before, "depth_m") + 1e-6, CollectingSink.Field(after, "depth_m") - 1e-6);
        var reported = sink.OfKind("ground.telemetry").Last();
        Assert.Equal(truth, CollectingSink.Field(reported, "depth_m"), 9);
    }

    [Fact]
    public async Task Ground_latency_is_fibre_plus_station_plus_light_time()
    {
        var (scenario, _, sink, _) = await SharedRuns.OfDefaultAsync();
        var frame = sink.OfKind("ground.telemetry").First(r => CollectingSink.IntegerField(r, "frame") == 1000);

        // Computed: depth / fibre signal speed + station forwarding delay + distance / c (c exact by SI).
        var expected = (CollectingSink.Field(frame, "depth_m") / scenario.Tether.SignalSpeedMPerS)
                       + scenario.Station.ForwardingDelayS
                       + (scenario.Body.DistanceToGroundM / StationComponent.SpeedOfLightMPerS);
        // Each of the three delays is rounded to the 1 µs tick.
        Assert.Equal(expected, CollectingSink.Field(frame, "latency_s"), 3e-6);
    }

    [Fact]
    public async Task A_broken_tether_loses_every_later_frame_and_says_so()
    {
        var scenario = MissionHarness.Edited(("run:\n", "  - name: fibre-shear\n    kind: tether_break\n    at: 60 d\nrun:\n"));
        var (summary, sink) = await MissionHarness.RunAsync(scenario);

        var broken = sink.OfKind("tether.broken").Single();
        Assert.Equal(60 * 86400.0, broken.Time.SecondsSinceEpoch, 6);
        var framesAfter = sink.OfKind("probe.telemetry").Count(r => r.Time >= broken.Time);
        Assert.Equal(framesAfter, sink.OfKind("data.lost").Count());
        Assert.Equal(framesAfter, summary.FramesLost);
        Assert.Equal(RunOutcomeKind.Completed, summary.Outcome.Kind);
    }

    [Fact]
    public async Task A_station_outage_shows_on_the_ground_as_a_gap_of_the_lost_frames()
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
