using DescentOps.Tests.Shared;

namespace DescentOps.Mission.Tests.Autonomy;

/// <summary>
/// Ground rules run on the frames' sampling time, and frames reach the ground a downlink after they were sampled. A
/// rule's timer (a persistence, a time since an event) that ends later than the ground's clock must not move the rules
/// past frames still on their way: the ground can know that a condition held until an instant only from a frame
/// sampled then. The default scenario is an invented mission: 10-minute frames, a downlink of 2 s of forwarding plus
/// 1.08e12 m of light time (3602.49 s) plus a few microseconds of fibre.
/// </summary>
public sealed class GroundRuleClockTests
{
    /// <param name="condition">The rule's condition: a timer of two hours, longer than the downlink.</param>
    /// <param name="endAfterS">
    /// When the condition first holds on a frame sampled after the first frame past 0.5 m: "for 2 h" holds on the
    /// frame sampled exactly 7200 s later; "time since ... above 2 h" is strict (LANGUAGE.md: a tick past 2 h), so on the
    /// next frame, 7800 s later.
    /// </param>
    [Theory]
    [InlineData("probe.depth above 0.5 m for 2 h", 7200)]
    [InlineData("time since (probe.depth above 0.5 m) above 2 h", 7800)]
    public async Task A_ground_rule_whose_timer_ends_beyond_the_downlink_fires_on_the_frame_sampled_at_its_end_and_refuses_no_frame(string condition, double endAfterS)
    {
        var scenario = TestScenario.Default.Set("run.until", "1 d").AddSection($$"""
            rules: |
              rule two-hours-deep {
                runs on ground
                severity info
                when {{condition}}
                then { send probe.wall set_power(power = 10 kW) }
              }
            """).Load();
        var (_, sink) = await MissionHarness.RunAsync(scenario);

        Assert.Empty(sink.OfKind("rule.sample_rejected"));
        // The first frame past 0.5 m, and the frame sampled when the condition first holds (frames every 600 s).
        var first = sink.OfKind("probe.telemetry").First(r => CollectingSink.Field(r, "depth_m") > 0.5).Time;
        var endS = first.SecondsSinceEpoch + endAfterS;
        var endFrame = sink.OfKind("probe.telemetry").First(r => r.Time.SecondsSinceEpoch >= endS);
        Assert.Equal(endS, endFrame.Time.SecondsSinceEpoch, 6);
        // The ground fires when that frame arrives: its sampling time plus its latency (one downlink), not at 2 h after
        // the first frame by the ground's own clock, an hour before the frame that shows it.
        var arrival = sink.OfKind("ground.telemetry").First(r => Math.Abs(r.Time.SecondsSinceEpoch - CollectingSink.Field(r, "latency_s") - endS) < 1e-3);
        var fired = sink.OfKind("rule.fired").First();
        Assert.Equal(arrival.Time, fired.Time);
        Assert.Equal(endS + 2 + (1.08e12 / 299_792_458.0), fired.Time.SecondsSinceEpoch, 3);
    }
}
