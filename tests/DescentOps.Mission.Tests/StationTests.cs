using DescentOps.Engine.Randomness;
using DescentOps.Engine.Running;
using DescentOps.Mission.Running;
using DescentOps.Mission.Station;
using DescentOps.Physics.Radiation;
using DescentOps.Records;
using DescentOps.Scenarios;
using DescentOps.Scenarios.Loading;
using DescentOps.Scenarios.Model;
using DescentOps.Tests.Shared;

namespace DescentOps.Mission.Tests;

/// <summary>
/// The surface station's optional parts in whole runs: death by dose, the windows home and their queues, the surface
/// dwell, and discharge upsets. Inputs not named as sourced are test inputs of invented missions; every expected value
/// is computed here from them.
/// </summary>
public sealed class StationTests
{
    private const double Day = 86_400.0;
    private const string ScenarioName = "station-dies-before-breakthrough.yaml";

    private static string Text(string name) => BuiltInScenarios.Text(name);

    private static string Edit(string text, params (string Line, string Replacement)[] edits) =>
        edits.Aggregate(TestScenario.Of(text, ScenarioName), (t, edit) => t.Replace(edit.Line, edit.Replacement)).Text;

    private static Task<(MissionSummary Summary, CollectingSink Sink)> RunAsync(string text) =>
        MissionHarness.RunAsync(ScenarioLoader.LoadText(text, "station-test.yaml"));

    private static double Number(JournalRecord record, string name) => CollectingSink.Field(record, name);

    private static string TextField(JournalRecord record, string name) => record.Fields.Single(f => f.Name == name).Text!;

    [Fact]
    public async Task The_station_dies_by_dose_before_breakthrough_and_the_ground_goes_blind()
    {
        var (scenario, summary, sink, _) = await SharedRuns.OfBuiltInAsync(ScenarioName);

        // Electronics dose rate, computed from the scenario: 5 Gy/d at the surface; behind 3 cm of ice the electron share
        // 0.9 falls off over 2 cm and the photon share 0.1 over 15.37 cm (loader defaults); silicon takes
        // (14/28.0855)/(10/18.0153) of the water dose (electrons per unit mass).
        var surfaceGyPerS = 5.0 / Day;
        var waterGyPerS = surfaceGyPerS * ((0.9 * Math.Exp(-0.03 / 0.02)) + (0.1 * Math.Exp(-0.03 / 0.1537)));
        var siliconGyPerS = waterGyPerS * (14.0 / 28.0855) / (10.0 / 18.0153);
        var radiation = sink.OfKind("station.radiation").Single();
        Assert.Equal(siliconGyPerS, Number(radiation, "electronics_dose_rate_gy_si_s"), 12);

        // Weibull median life from its formula: median dose η·(ln 2)^(1/β) with η 60 Gy, β 4, over the rate.
        var medianGy = 60.0 * Math.Pow(Math.Log(2.0), 1.0 / 4.0);
        Assert.Equal(medianGy / siliconGyPerS, Number(radiation, "median_life_s"), 6);

        // The failure dose is the one the station's own stream gives for the run's seed, and it fails exactly when the
        // dose reaches it (to the microsecond tick).
        var failureGy = Number(radiation, "failure_dose_gy_si");
        var drawn = new StationDose(scenario.Station.Radiation!).DrawFailureDoseGy(new RandomStream(scenario.Run.Seed, MissionIds.Station));
        Assert.Equal(drawn, failureGy);
        var failed = sink.OfKind("station.failed").Single();
        Assert.Equal("dose", TextField(failed, "cause"));
        Assert.Equal(failureGy / siliconGyPerS, failed.Time.SecondsSinceEpoch, 5);
        Assert.Equal(failureGy, Number(failed, "dose_gy_si"), 9);

        // The data rate against the reference's link check: 33.94 dB-Hz at 5.2 AU with these radios (DS-8, CALC,
        // links-power-ocean note), scaled by the square of the distance to 1.08e9 km; one 4096-bit frame takes 4096 / R.
        var rateBitPerS = Math.Pow(10.0, 3.394) * Math.Pow(5.2 * 149_597_870_700.0 / 1.08e12, 2);
        var link = sink.OfKind("station.link").Single();
        Assert.Equal(rateBitPerS, Number(link, "data_rate_bit_s"), rateBitPerS * 0.012);
        Assert.Equal(4096 / rateBitPerS, Number(link, "frame_time_s"), 0.012 * 4096 / rateBitPerS);

        // Before breakthrough.
        Assert.NotNull(summary.BreakthroughTimeS);
        Assert.True(failed.Time.SecondsSinceEpoch < summary.BreakthroughTimeS!.Value);

        // Every frame is accounted for: received at home, or lost at the station with a record (those queued when it
        // died in one data-lost record, later ones one by one); none silently.
        var queuedLost = sink.OfKind("station.data_lost").Sum(r => CollectingSink.IntegerField(r, "count"));
        var lostAfter = sink.OfKind("station.frame_lost").Count();
        Assert.True(queuedLost > 0, "home was out of view when the station died, so frames were waiting");
        Assert.True(lostAfter > 0);
        Assert.Equal(summary.FramesSent, summary.FramesReceivedOnGround + queuedLost + lostAfter);

        // The frames lost after the death are one episode: one warning, the rest at info, each frame still recorded
        // with its running count.
        var frameLost = sink.OfKind("station.frame_lost").ToList();
        Assert.Single(frameLost, r => r.Severity == Severity.Warning);
        Assert.Equal(frameLost.Count, CollectingSink.IntegerField(frameLost[^1], "lost_in_episode"));
        // The ground is blind from the death to the end (frames taken after its last received frame), at least.
        Assert.True(summary.TimeBlindS >= summary.FinalTimeS - failed.Time.SecondsSinceEpoch - 3600, $"{summary.TimeBlindS} s blind");
        Assert.Equal(0, summary.FramesHeldOrInFlight);
        Assert.Equal(queuedLost + lostAfter, summary.FramesLost);

        // The ground sees nothing sampled after the death, so its rule stays blind to the day-80 power sag.
        var firstLost = sink.OfKind("station.data_lost").Select(r => CollectingSink.IntegerField(r, "frame")).Min();
        Assert.All(sink.OfKind("ground.telemetry"), r => Assert.True(CollectingSink.IntegerField(r, "frame") < firstLost));
        Assert.Empty(sink.OfKind("rule.fired"));
        var sag = Assert.Single(summary.Faults);
        Assert.Null(sag.DetectedAfterS);

        // The probe carries on alone and its vehicles finish: the mission completes without the ground watching.
        Assert.Equal(RunOutcomeKind.Completed, summary.Outcome.Kind);
    }

    [Fact]
    public async Task With_a_station_that_lives_the_same_ground_rule_catches_the_sag()
    {
        var text = Text(ScenarioName);
        var start = text.IndexOf("  radiation:\n", StringComparison.Ordinal);
        var end = text.IndexOf("  link:\n", StringComparison.Ordinal);
        var (summary, sink) = await RunAsync(text[..start] + text[end..]);

        Assert.Empty(sink.OfKind("station.failed"));
        // It fires on the sag (day 80 for a day), and only then.
        Assert.NotEmpty(sink.OfKind("rule.fired"));
        Assert.All(sink.OfKind("rule.fired"), r => Assert.InRange(r.Time.SecondsSinceEpoch, 80 * Day, 82 * Day));
        Assert.NotNull(Assert.Single(summary.Faults).DetectedAfterS);
    }

    [Fact]
    public void The_failure_dose_is_fixed_by_seed_and_differs_between_seeds()
    {
        var model = ScenarioLoader.LoadText(Text(ScenarioName), ScenarioName).Station.Radiation!;
        var dose = new StationDose(model);
        double Draw(long seed) => dose.DrawFailureDoseGy(new RandomStream(seed, MissionIds.Station));

        Assert.Equal(Draw(7), Draw(7));
        Assert.Equal(Draw(20261202), Draw(20261202));
        Assert.NotEqual(Draw(7), Draw(8));

        // The lognormal draw too: D50·exp(σ·z) for the stream's first standard normal z.
        var lognormal = new StationDose(model with { FailureModel = DoseFailureModel.Lognormal, FailureDoseGy = 300, FailureSpread = 0.5 });
        var z = new RandomStream(7, MissionIds.Station).NextNormal(0.0, 1.0);
        Assert.Equal(300 * Math.Exp(0.5 * z), lognormal.DrawFailureDoseGy(new RandomStream(7, MissionIds.Station)), 9);
    }

    /// <summary>
    /// An invented geometry with round numbers: a 10-hour turn seen from the equator with no mask, home rising at the
    /// start (hour angle −90°), so home is up for [0, 5 h), [10 h, 15 h), ...; and home 3 light-hours away.
    /// </summary>
    private static string WindowedDefault(string rules) => Edit(
        MissionHarness.DefaultText,
        ("distance_to_ground: 1.08e9 km", "distance_to_ground: 3237758546.4 km"),
        ("  forwarding_delay: 2 s\n", "  forwarding_delay: 2 s\n  link:\n    rotation_period: 10 h\n    latitude: 0 deg\n    start_hour_angle: -90 deg\n"),
        ("faults:", rules + "\nfaults:"),
        ("until: 400 d", "until: 2 d"));

    private const string FirstFrameRule = """
        rules: |
          rule first-frame-seen {
            runs on ground
            severity info
            when probe.regime is Sublimating
            then { send probe.wall set_power(power = 3 kW) }
          }
        """;

    [Fact]
    public async Task A_ground_command_that_reaches_the_station_out_of_view_waits_for_the_next_window()
    {
        // Light time: 3 h × c = 10 800 s × 299 792 458 m/s = 3 237 758 546.4 km, as written in the scenario.
        const double lightS = 10_800.0, forwardS = 2.0, turnS = 36_000.0;
        var (_, sink) = await RunAsync(WindowedDefault(FirstFrameRule));

        // Frame 1 leaves the probe at 0, the station at 2 s (window open, no radio: no time on the air), reaches home
        // at 2 s + 3 h; the rule fires on it and its command reaches the station a light time later, at 6 h + 2 s:
        // home set at 5 h, so it waits for the next rise, one turn after the first, at 10 h.
        Assert.Equal(lightS, Number(sink.OfKind("station.started").Single(), "one_way_light_time_s"), 6);
        var fired = sink.OfKind("rule.fired").First();
        Assert.Equal(forwardS + lightS, fired.Time.SecondsSinceEpoch, 6);
        var queued = sink.OfKind("station.command_queued").First();
        Assert.Equal(forwardS + (2 * lightS), queued.Time.SecondsSinceEpoch, 6);
        Assert.Equal(turnS, Number(queued, "window_opens_t_s"), 3);
        var released = sink.OfKind("station.command_released").First();
        Assert.Equal(turnS, released.Time.SecondsSinceEpoch, 5);
        Assert.Equal(turnS - (forwardS + (2 * lightS)), Number(released, "held_s"), 5);

        // Down the station's forwarding delay and the fibre (a few metres of it: well under a millisecond).
        var executed = sink.OfKind("command.executed").First();
        Assert.InRange(executed.Time.SecondsSinceEpoch, turnS + forwardS, turnS + forwardS + 1e-3);
        Assert.Equal(turnS + forwardS - fired.Time.SecondsSinceEpoch, Number(executed, "latency_s"), 3);

        // Without the link geometry the same command arrives at 2 + 3 h + 3 h + 2 s: the window cost it 14 398 s.
        var plain = Edit(WindowedDefault(FirstFrameRule), ("  link:\n    rotation_period: 10 h\n    latitude: 0 deg\n    start_hour_angle: -90 deg\n", ""));
        var (_, plainSink) = await RunAsync(plain);
        var direct = plainSink.OfKind("command.executed").First();
        Assert.InRange(direct.Time.SecondsSinceEpoch, (2 * forwardS) + (2 * lightS), (2 * forwardS) + (2 * lightS) + 1e-3);
        Assert.Equal(14_398.0, executed.Time.SecondsSinceEpoch - direct.Time.SecondsSinceEpoch, 2);
    }

    [Fact]
    public async Task A_full_queue_loses_frames_with_a_record_and_none_silently()
    {
        // Home is down for 5 h of each 10-hour turn: 30 frames at 10-minute intervals arrive in a gap; the queue
        // holds 10, so at least 20 of each gap's frames are lost (the 31st, at the rising instant, may queue too).
        var text = Edit(WindowedDefault(""), ("  forwarding_delay: 2 s\n", "  forwarding_delay: 2 s\n  frame_queue_capacity: 10\n"));
        var (summary, sink) = await RunAsync(text);

        var full = sink.OfKind("station.data_lost").Where(r => TextField(r, "cause") == "frame queue full").ToList();
        var firstGap = full.Where(r => r.Time.SecondsSinceEpoch is >= 5 * 3600.0 and <= 10 * 3600.0).ToList();
        Assert.InRange(firstGap.Count, 20, 21);
        Assert.All(full, r => Assert.Equal("telemetry", TextField(r, "data")));
        var queuedAtEnd = summary.FramesSent - summary.FramesReceivedOnGround - summary.FramesLost;
        Assert.Equal(full.Count, summary.FramesLost);
        // What is neither received nor lost is still in the queue or on its way home (at most the queue and 3 h of frames).
        Assert.InRange(queuedAtEnd, 0, 10 + 18 + 1);
    }

    [Fact]
    public async Task The_probe_waits_out_the_dwell_and_the_log_shows_the_log_reduction()
    {
        // Test inputs: 5 Gy/d at the surface for a 10-day dwell with a D10 of 20 Gy (invented; real spore D10 values
        // are far larger). The station's lognormal parts are rated well above what 10 days give.
        var text = Edit(
            MissionHarness.DefaultText,
            ("  forwarding_delay: 2 s\n", "  forwarding_delay: 2 s\n  radiation:\n    dose_rate: 5 Gy/d\n    failure_model: lognormal\n    failure_dose: 300 Gy\n    failure_spread: 0.3\n  dwell:\n    duration: 10 d\n    d_value: 20 Gy\n"),
            ("until: 400 d", "until: 12 d"));
        var (_, sink) = await RunAsync(text);

        // Exposed dose 5 Gy/d × 10 d = 50 Gy; log reduction 50 / 20 = 2.5 decades.
        var ended = sink.OfKind("station.dwell_ended").Single();
        Assert.Equal(10 * Day, ended.Time.SecondsSinceEpoch, 6);
        Assert.Equal(50.0, Number(ended, "exposed_dose_gy"), 9);
        Assert.Equal(2.5, Number(ended, "log_reduction"), 9);
        Assert.Equal(BioburdenReduction.LogReductionFromDose(50.0, 20.0), Number(ended, "log_reduction"), 12);
        // No shielding: the electronics took 50 Gy of water dose, 50 × 0.898 Gy(Si), against a 300 Gy(Si) median.
        Assert.Equal(50.0 * DoseAccumulation.SiliconPerWaterDoseRatio / 300.0, Number(ended, "station_dose_share_of_median"), 9);

        var started = sink.OfKind("probe.descent_started").Single();
        Assert.Equal(10 * Day, started.Time.SecondsSinceEpoch, 6);
        Assert.Equal(2.5, Number(started, "log_reduction"), 9);

        // Still, heaters off, until the dwell ends; descending after it.
        var frames = sink.OfKind("probe.telemetry").ToList();
        Assert.All(frames.Where(f => f.Time.SecondsSinceEpoch < 10 * Day), f =>
        {
            Assert.Equal(0.0, Number(f, "depth_m"));
            Assert.Equal(0.0, Number(f, "head_power_w"));
        });
        Assert.True(Number(frames[^1], "depth_m") > 0.0);
    }

    [Fact]
    public async Task Upsets_reset_the_station_and_frames_arriving_during_recovery_are_lost_by_rule_or_queued()
    {
        // Test inputs: a mean of 2 days between upsets over a 20-day run (about 10 expected; the chance of none is
        // e^-10), each costing 6 hours.
        const double recoveryS = 6 * 3600.0;
        string Charged(string rule) => Edit(
            MissionHarness.DefaultText,
            ("  forwarding_delay: 2 s\n", $"  forwarding_delay: 2 s\n  charging:\n    upset_interval: 2 d\n    recovery_time: 6 h\n    during_recovery: {rule}\n"),
            ("until: 400 d", "until: 20 d"));

        var (lostSummary, lostSink) = await RunAsync(Charged("lose"));
        var upsets = lostSink.OfKind("station.upset").Select(r => r.Time.SecondsSinceEpoch).ToList();
        Assert.NotEmpty(upsets);
        bool InRecovery(double t) => upsets.Any(u => t >= u && t < u + recoveryS);

        // A frame reaches the station microseconds after it is sampled (a few metres of fibre), so the frames lost are
        // exactly those sampled while a recovery lasted (none falls within microseconds of an edge with this seed).
        var lost = lostSink.OfKind("station.data_lost").ToList();
        Assert.All(lost, r => Assert.Equal("station recovering from an upset", TextField(r, "cause")));
        var expectedLost = lostSink.OfKind("probe.telemetry").Count(f => InRecovery(f.Time.SecondsSinceEpoch));
        Assert.True(expectedLost > 0);
        Assert.Equal(expectedLost, lost.Count);
        Assert.Equal(expectedLost, lostSummary.FramesLost);

        // Queued instead: nothing is lost, and the longest a frame waits is the longest stretch of recovery (an upset
        // during a recovery extends it), less at most one 10-minute frame interval, plus the forwarding and light time.
        var (queuedSummary, queuedSink) = await RunAsync(Charged("queue"));
        Assert.Equal(0, queuedSummary.FramesLost);
        var longestS = 0.0;
        var (from, to) = (upsets[0], upsets[0] + recoveryS);
        foreach (var u in upsets.Skip(1).Append(double.PositiveInfinity))
        {
            if (u < to)
            {
                to = Math.Max(to, u + recoveryS);
                continue;
            }

            longestS = Math.Max(longestS, to - from);
            (from, to) = (u, u + recoveryS);
        }

        var lightS = ScenarioLoader.LoadText(MissionHarness.DefaultText, "d.yaml").Body.DistanceToGroundM / StationComponent.SpeedOfLightMPerS;
        var worst = queuedSink.OfKind("ground.telemetry").Max(r => Number(r, "latency_s"));
        Assert.InRange(worst, lightS + longestS - 600.0, lightS + longestS + 3.0);
    }

    [Fact]
    public async Task A_scheduled_upset_holds_frames_for_its_recovery_time_and_the_summary_measures_it()
    {
        // Test inputs: an upset fault at day 2 lasting 3 h on the plain relay of the default scenario, run for 3 days.
        const double startS = 2 * Day, recoveryS = 3 * 3600.0;
        var text = Edit(
            MissionHarness.DefaultText,
            ("  - name: bus-sag-day-30\n    kind: power_dip\n    at: 30 d\n    duration: 12 h\n    remaining_fraction: 0.7\n",
             "  - name: discharge-day-2\n    kind: station_upset\n    at: 2 d\n    duration: 3 h\n"),
            ("until: 400 d", "until: 3 d"));
        var (summary, sink) = await RunAsync(text);

        var upset = sink.OfKind("station.upset").Single();
        Assert.Equal(startS, upset.Time.SecondsSinceEpoch, 6);
        Assert.Equal("fault 'discharge-day-2'", TextField(upset, "cause"));
        var recovered = sink.OfKind("station.upset_recovered").Single();
        Assert.Equal(startS + recoveryS, recovered.Time.SecondsSinceEpoch, 6);

        // Day 2 falls on a frame (a 10-minute multiple): frames sampled at 2 d, 2 d + 10 min, ... 2 d + 2 h 50 min
        // (18 of them) wait and go at the end of the recovery; none is lost.
        Assert.Equal(0, summary.FramesLost);
        var held = sink.OfKind("station.link_resumed").Single();
        Assert.Equal(18, CollectingSink.IntegerField(held, "frames_queued"));
        Assert.Equal(recoveryS, Number(held, "waited_s"), 3);
        Assert.Equal(recoveryS, Assert.Single(summary.Faults).RecoveredAfterS!.Value, 6);
    }

    [Fact]
    public void A_frame_goes_only_if_it_fits_whole_before_the_window_closes()
    {
        // The windowed geometry above (up for [0, 5 h) of each 10 h) with a radio whose rate the link equation sets.
        var text = Edit(
            WindowedDefault(""),
            ("    start_hour_angle: -90 deg\n", "    start_hour_angle: -90 deg\n    radio:\n      transmit_power: 20 W\n      dish_diameter: 1 m\n      ground_dish_diameter: 34 m\n      frequency: 8.4 GHz\n      system_noise_temperature: 40 K\n      line_loss: 1\n      required_eb_n0: 2.5\n      margin: 3\n      frame_bits: 10000\n"));
        var link = new HomeLink(ScenarioLoader.LoadText(text, "radio.yaml"));
        var frameS = link.FrameTimeS;
        Assert.Equal(10_000 / link.DataRateBitPerS, frameS, 9);
        Assert.InRange(frameS, 1.0, 3600.0);

        const double closesS = 5 * 3600.0, opensS = 10 * 3600.0;
        Assert.Equal(closesS - (2 * frameS), link.NextFrameStartS(closesS - (2 * frameS)), 6);
        Assert.Equal(closesS - frameS, link.NextFrameStartS(closesS - frameS), 6);
        Assert.Equal(opensS, link.NextFrameStartS(closesS - (frameS / 2)), 3);
        Assert.Equal(opensS, link.NextFrameStartS(closesS + 1.0), 3);
    }
}
