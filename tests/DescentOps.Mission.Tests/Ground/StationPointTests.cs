using DescentOps.Mission.Station;
using DescentOps.Records;
using DescentOps.Tests.Shared;

namespace DescentOps.Mission.Tests.Ground;

/// <summary>
/// Ground rules on <c>station.alive</c> and <c>station.in_view</c> in whole runs of the default scenario (an invented
/// mission: 10-minute frames, 1.08e9 km home, 2 s of forwarding) with test inputs added. Expected instants are computed
/// here: light time 1.08e12 m / 299 792 458 m/s (exact by the SI definition of the metre) = 3602.49 s, the default
/// silence timeout 600 s, window edges from the scenario's own link geometry.
/// </summary>
public sealed class StationPointTests
{
    private const double LightS = 1.08e12 / 299_792_458.0;

    private const string Windows = "  forwarding_delay: 2 s\n  link:\n    rotation_period: 10 h\n    latitude: 0 deg\n    start_hour_angle: -90 deg\n";

    private static TestScenario WithRule(TestScenario scenario, string condition) => scenario.Set("run.until", "3 d").AddSection($$"""
        rules: |
          rule station-watch {
            runs on ground
            severity high
            when {{condition}}
            then { send probe enter_safe_mode }
          }
        """);

    private static TestScenario StationFailsAt(TestScenario scenario, string at) =>
        scenario.Replace("faults:\n", $"faults:\n  - name: station-cut\n    kind: station_failure\n    at: {at}\n");

    private static string Text(JournalRecord record, string name) => record.Fields.Single(f => f.Name == name).Text!;

    [Fact]
    public async Task A_ground_rule_on_station_alive_fires_a_light_time_and_the_silence_timeout_after_the_station_dies()
    {
        var scenario = WithRule(StationFailsAt(TestScenario.Default, "1 d"), "station.alive is no").Load();
        var (_, sink) = await MissionHarness.RunAsync(scenario);

        // Dies at 86 400 s; its carrier stops reaching the ground a light time later; the ground waits the timeout.
        var failed = Assert.Single(sink.OfKind("station.failed"));
        Assert.Equal(86_400.0, failed.Time.SecondsSinceEpoch, 6);
        var expectedS = 86_400.0 + LightS + 600.0;
        var fired = Assert.Single(sink.OfKind("rule.fired"));
        Assert.Equal(expectedS, fired.Time.SecondsSinceEpoch, 3);
        Assert.Equal(4202.49, fired.Time.SecondsSinceEpoch - failed.Time.SecondsSinceEpoch, 2);

        // The status is stamped with the sampling time of the latest frame the ground held (arrival less latency).
        var lastFrame = sink.OfKind("ground.telemetry").Last(r => r.Time < fired.Time);
        var stampS = lastFrame.Time.SecondsSinceEpoch - CollectingSink.Field(lastFrame, "latency_s");
        var status = Assert.Single(sink.OfKind("ground.station_status"));
        Assert.Equal(("no", "yes", "silence past the timeout"), (Text(status, "alive"), Text(status, "in_view"), Text(status, "cause")));
        Assert.Equal(stampS, CollectingSink.Field(status, "stamp_t_s"), 6);
        Assert.Contains(FormattableString.Invariant($"station.alive=no@{stampS:R}s"), Text(fired, "evidence"), StringComparison.Ordinal);
        // Nothing the ground received was refused, and no frame arrived after the station died plus a downlink.
        Assert.Empty(sink.OfKind("rule.sample_rejected"));
        Assert.True(lastFrame.Time.SecondsSinceEpoch <= 86_400.0 + 2 + LightS + 1e-3);
    }

    [Fact]
    public async Task A_ground_rule_on_station_in_view_fires_a_light_time_after_home_sets_and_the_station_stays_alive()
    {
        var scenario = WithRule(TestScenario.Default.Replace("  forwarding_delay: 2 s\n", Windows), "station.in_view is no").Load();
        var (_, sink) = await MissionHarness.RunAsync(scenario);

        var link = new HomeLink(scenario);
        var setsS = link.ClosingS(link.NextOpeningS(0) + 1);
        var fired = sink.OfKind("rule.fired").First();
        Assert.Equal(StationTransmitter.CeilingTick(setsS).SecondsSinceEpoch + LightS, fired.Time.SecondsSinceEpoch, 3);
        // Home setting is not silence: the ground never takes the station for dead.
        Assert.All(sink.OfKind("ground.station_status"), r => Assert.Equal("yes", Text(r, "alive")));
        Assert.Equal(["no", "yes"], sink.OfKind("ground.station_status").Take(2).Select(r => Text(r, "in_view")));
    }

    [Fact]
    public async Task A_station_that_dies_out_of_view_is_taken_for_dead_the_timeout_after_home_rises_again()
    {
        var plain = WithRule(TestScenario.Default.Replace("  forwarding_delay: 2 s\n", Windows), "station.alive is no");
        var link = new HomeLink(plain.Load());
        var setsS = link.ClosingS(link.NextOpeningS(0) + 1);
        var risesS = link.NextOpeningS(setsS + 1);
        var dieS = Math.Round((setsS + risesS) / 2);
        var scenario = StationFailsAt(plain, FormattableString.Invariant($"{dieS} s")).Load();
        var (_, sink) = await MissionHarness.RunAsync(scenario);

        Assert.False(link.IsOpen(dieS));
        var fired = Assert.Single(sink.OfKind("rule.fired"));
        Assert.Equal(StationTransmitter.CeilingTick(risesS).SecondsSinceEpoch + LightS + 600.0, fired.Time.SecondsSinceEpoch, 3);
    }

    [Fact]
    public async Task Without_a_reader_of_the_station_points_nothing_new_is_sent_or_logged()
    {
        var scenario = StationFailsAt(TestScenario.Default, "1 d").Set("run.until", "2 d").Load();
        var (_, sink) = await MissionHarness.RunAsync(scenario);
        Assert.Empty(sink.OfKind("ground.station_status"));
        Assert.NotEmpty(sink.OfKind("station.failed"));
    }
}
