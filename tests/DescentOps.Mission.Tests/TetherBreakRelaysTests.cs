using DescentOps.Records;
using DescentOps.Engine.Running;
using DescentOps.Mission.Running;
using DescentOps.Mission.Station;
using DescentOps.Scenarios;
using DescentOps.Scenarios.Loading;
using DescentOps.Scenarios.Model;

namespace DescentOps.Mission.Tests;

/// <summary>
/// The "tether break handled by relays" contingency: the fibre shears at 1000 m; with its relays the ground keeps
/// seeing the probe and its rule acts; without them the same break leaves the ground blind and frames are lost.
/// Counts come from the logs.
/// </summary>
public sealed class TetherBreakRelaysTests
{
    private const string Name = "tether-break-relays.yaml";
    private static async Task<(MissionSummary Summary, CollectingSink Sink)> WithRelaysAsync()
    {
        var run = await SharedRuns.OfBuiltInAsync(Name);
        return (run.Summary, run.Sink);
    }

    private static Scenario Load(string text) => ScenarioLoader.LoadText(text, Name);

    private static string Text(JournalRecord record, string name) => record.Fields.Single(f => f.Name == name).Text!;

    /// <summary>The same scenario with no relays: the relays section and the relay's fault go; the rules stay.</summary>
    private static string WithoutRelays()
    {
        var text = BuiltInScenarios.Text(Name);
        var relays = text.IndexOf("\nrelays:\n", StringComparison.Ordinal);
        var vehicles = text.IndexOf("\nvehicles:\n", StringComparison.Ordinal);
        var fault = text.IndexOf("  - name: warm-relay-quiet\n", StringComparison.Ordinal);
        var rules = text.IndexOf("\nrules: |", StringComparison.Ordinal);
        Assert.True(relays > 0 && vehicles > relays && fault > vehicles && rules > fault);
        return text[..relays] + text[vehicles..fault] + text[rules..];
    }

    [Fact]
    public async Task Relays_carry_every_frame_home_after_the_break_and_the_ground_rule_acts()
    {
        var scenario = Load(BuiltInScenarios.Text(Name));
        var (summary, sink) = await WithRelaysAsync();

        Assert.Equal(RunOutcomeKind.Completed, summary.Outcome.Kind);
        var broken = sink.OfKind("tether.broken").Single();
        Assert.InRange(CollectingSink.Field(broken, "paid_out_m"), 999.0, 1000.0); // at_depth 1000 m, seen by the frame that crosses it
        Assert.Empty(sink.OfKind("data.lost"));
        Assert.Equal(0, summary.FramesLost);
        Assert.Empty(sink.OfKind("ground.gap"));

        // Every frame sent after the break reaches the ground, except those still in flight when the run ends: at most
        // ceil(3608 s / 600 s) = 7, with 3608 s ≈ light time 1.08e12 m / c (3602.5 s) + station 2 s + 6 relays × 0.5 s.
        var firstAfter = sink.OfKind("probe.telemetry").First(r => r.Time >= broken.Time);
        var sentAfter = sink.OfKind("probe.telemetry").Count(r => r.Time >= broken.Time);
        var receivedAfter = sink.OfKind("ground.telemetry").Count(r => CollectingSink.IntegerField(r, "frame") >= CollectingSink.IntegerField(firstAfter, "frame"));
        Assert.InRange(sentAfter - receivedAfter, 0, 7);

        var fired = Assert.Single(sink.OfKind("rule.fired"), r => Text(r, "rule") == "gentle-approach");
        Assert.Equal("ground", Text(fired, "placement"));
        var executed = Assert.Single(sink.OfKind("command.executed"), r => Text(r, "origin") == "gentle-approach");

        // Computed: the command goes up a light time, through the station (2 s), then down the relay chain: radio at
        // c/√ε′ (ε′ = 3.2, M07-std) over the probe's depth, and 0.5 s in each of the 5 relays then in the water.
        var depth = sink.OfKind("probe.telemetry").Last(r => r.Time <= executed.Time).Fields.Single(f => f.Name == "depth_m").Number;
        var lightS = scenario.Body.DistanceToGroundM / StationComponent.SpeedOfLightMPerS;
        var expected = lightS + scenario.Station.ForwardingDelayS + (depth * Math.Sqrt(3.2) / StationComponent.SpeedOfLightMPerS) + (5 * 0.5);
        Assert.Equal(5, sink.OfKind("relay.dropped").Count(r => r.Time <= fired.Time));
        // The depth is the last frame's, up to 10 min of descent (< 0.2 m, < 2 ns of radio) before the command arrives.
        Assert.Equal(expected, CollectingSink.Field(executed, "latency_s"), 5e-6);
    }

    [Fact]
    public async Task While_the_warm_ice_relay_is_out_the_probe_holds_its_frames_and_sends_them_when_it_returns()
    {
        var (_, sink) = await WithRelaysAsync();
        var failed = sink.OfKind("relay.failed").Single();
        var down = sink.OfKind("relay.path_down").Single();
        var up = sink.OfKind("relay.path_up").Last();
        Assert.Equal(failed.Time, down.Time);
        Assert.Equal("relay-5", Text(failed, "relay"));

        // Computed: 18 h at one frame per 10 min, starting between two frames, holds 18 × 6 = 108 frames, all released
        // when the relay returns; the probe reports its fill one frame late, so the highest fill it reports is 107/144.
        Assert.Equal(108, CollectingSink.IntegerField(up, "frames_released"));
        Assert.Equal(0, CollectingSink.IntegerField(up, "frames_held"));
        var highest = sink.OfKind("probe.telemetry").Max(r => CollectingSink.Field(r, "buffer_fill"));
        Assert.Equal(107.0 / 144.0, highest, 12);

        // The ledger on every change of the link: produced = by fibre + by relays + held + lost.
        foreach (var record in sink.Records.Where(r => r.Fields.Any(f => f.Name == "frames_produced")))
        {
            long F(string name) => CollectingSink.IntegerField(record, name);
            Assert.Equal(F("frames_produced"), F("frames_by_fibre") + F("frames_by_relays") + F("frames_held") + F("frames_lost"));
        }
    }

    [Fact]
    public async Task Each_relay_reaches_less_far_than_the_one_above_it_as_the_ice_warms()
    {
        var (_, sink) = await WithRelaysAsync();
        var drops = sink.OfKind("relay.dropped").ToList();
        Assert.Equal(5, drops.Count); // 4 planned (every 500 m above 2500 m) and 1 by the on-board rule
        for (var i = 1; i < drops.Count; i++)
        {
            Assert.True(CollectingSink.Field(drops[i], "ice_temperature_k") > CollectingSink.Field(drops[i - 1], "ice_temperature_k"));
            Assert.True(CollectingSink.Field(drops[i], "range_m") <= CollectingSink.Field(drops[i - 1], "range_m"));
        }

        Assert.Equal("warm-ice-relay", Text(drops[^1], "origin"));
    }

    [Fact]
    public async Task Without_relays_the_same_break_leaves_the_ground_blind_loses_frames_and_the_ground_rule_never_acts()
    {
        var (withRelays, withSink) = await WithRelaysAsync();
        var (summary, sink) = await MissionHarness.RunAsync(Load(WithoutRelays()));

        var broken = sink.OfKind("tether.broken").Single();
        var afterBreak = sink.OfKind("probe.telemetry").Where(r => r.Time >= broken.Time).ToList();
        var firstAfter = CollectingSink.IntegerField(afterBreak[0], "frame");

        // Computed: the probe holds the first 144 frames after the break (tether.buffer_frames) and loses every later one.
        var lost = sink.OfKind("data.lost").ToList();
        Assert.Equal(afterBreak.Count - 144, lost.Count);
        Assert.All(lost, r => Assert.Equal("telemetry", Text(r, "kind")));
        Assert.Equal(afterBreak.Count - 144, summary.FramesLost);
        Assert.Equal(1.0, sink.OfKind("probe.telemetry").Max(r => CollectingSink.Field(r, "buffer_fill")));

        // The ground sees nothing from after the break, so its rule never fires; the on-board rule finds no relay to drop.
        Assert.DoesNotContain(sink.OfKind("ground.telemetry"), r => CollectingSink.IntegerField(r, "frame") >= firstAfter);
        Assert.DoesNotContain(sink.OfKind("rule.fired"), r => Text(r, "rule") == "gentle-approach");
        Assert.DoesNotContain(sink.OfKind("command.executed"), r => Text(r, "origin") == "gentle-approach");
        Assert.Single(sink.OfKind("relay.none_left"));

        // So the probe meets the ocean at full head power, where the ground wanted 4 kW.
        static double HeadAtBreakthrough(CollectingSink s)
        {
            var breakthrough = s.OfKind("probe.breakthrough").Single().Time; // once: inside the predicate it was a scan per frame
            return CollectingSink.Field(s.OfKind("probe.telemetry").Last(r => r.Time < breakthrough), "head_power_w");
        }

        Assert.Equal(4000.0, HeadAtBreakthrough(withSink));
        Assert.Equal(6000.0, HeadAtBreakthrough(sink));
        Assert.True(withRelays.FramesReceivedOnGround - summary.FramesReceivedOnGround >= afterBreak.Count - 4);
    }
}
