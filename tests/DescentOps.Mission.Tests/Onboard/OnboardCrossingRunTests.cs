
namespace DescentOps.Mission.Tests.Onboard;

/// <summary>
/// A limit check on board with sampling apart from the frames: `probe.depth above 1000 m` fires at the instant the
/// probe's depth reaches 1000 m, where the probe's own motion law puts it, not at a frame; the same rule on the ground
/// acts when the first frame past the limit has come up the fibre, through the station and across the light time.
/// The reference is the physics of the run itself: between two frames with no other probe event the depth is linear
/// in time (velocity held between events), so the crossing instant follows from the two frames' depths.
/// </summary>
public sealed class OnboardCrossingRunTests
{
    private const string OneSecond = "onboard_sampling:\n  interval: 1 s\n\n";
    private const double LimitM = 1000.0;
    private const double FrameS = 600.0;

    [Fact]
    public async Task An_onboard_depth_limit_fires_at_the_instant_the_depth_is_one_thousand_metres()
    {
        var (_, board) = await MissionHarness.RunAsync(OnboardScenarios.DepthRule("board", OneSecond));
        var (_, ground) = await MissionHarness.RunAsync(OnboardScenarios.DepthRule("ground", null));
        var fired = board.OfKind("rule.fired").Single();
        var firedS = fired.Time.SecondsSinceEpoch;

        // The frames before the firing are the same in both runs: sampling for the rules does not change the physics.
        var before = Frames(board).Where(f => f.T < firedS).ToList();
        Assert.Equal(before, Frames(ground).Take(before.Count).ToList());

        var (t0, d0, t1, d1) = Bracket(Frames(ground));
        var speed = (d1 - d0) / (t1 - t0);
        var expectedS = t0 + ((LimitM - d0) / speed);
        // To a millimetre by the physics: the depth the motion law gives at the firing instant.
        Assert.InRange(d0 + (speed * (firedS - t0)), LimitM, LimitM + 1e-3);
        // And to the microsecond tick: the first tick at which the depth is past the limit.
        Assert.InRange(firedS - expectedS, 0, 2e-6);
        Assert.NotEqual(0.0, Math.IEEERemainder(firedS, FrameS));

        var evidence = CollectingSink.TextField(fired, "evidence");
        Assert.Contains("(crossing)", evidence, StringComparison.Ordinal);
        var seen = double.Parse(evidence[(evidence.IndexOf('=') + 1)..evidence.IndexOf('@')], System.Globalization.CultureInfo.InvariantCulture);
        Assert.InRange(seen, LimitM, LimitM + 1e-3);
        Assert.True(seen > LimitM);

        // The command acts on the probe at the same instant (on board: no link in between).
        Assert.Equal(firedS, board.OfKind("command.executed").Single().Time.SecondsSinceEpoch);
    }

    [Fact]
    public async Task The_same_rule_on_the_ground_acts_one_frame_and_one_link_later()
    {
        var (_, ground) = await MissionHarness.RunAsync(OnboardScenarios.DepthRule("ground", OneSecond));
        var (t0, _, t1, _) = Bracket(Frames(ground));
        var firstPast = ground.OfKind("probe.telemetry").First(r => CollectingSink.Field(r, "depth_m") > LimitM);
        Assert.Equal(t1, firstPast.Time.SecondsSinceEpoch);
        Assert.Equal(FrameS, t1 - t0);

        // The frame reaches the ground after the fibre, the station's forwarding delay and the light time; the rule fires then.
        var frame = CollectingSink.IntegerField(firstPast, "frame");
        var arrival = ground.OfKind("ground.telemetry").Single(r => CollectingSink.IntegerField(r, "frame") == frame);
        var latencyS = CollectingSink.Field(arrival, "latency_s");
        var fired = ground.OfKind("rule.fired").Single();
        Assert.Equal(arrival.Time, fired.Time);
        Assert.Equal(t1 + latencyS, fired.Time.SecondsSinceEpoch, 6);
        // Light time of 1.08e9 km at c = 299 792 458 m/s is 3602.49 s; the station adds its 2 s, the fibre microseconds.
        Assert.InRange(latencyS, 1.08e12 / 299_792_458.0 + 2.0, 1.08e12 / 299_792_458.0 + 2.001);
        Assert.DoesNotContain("(crossing)", CollectingSink.TextField(fired, "evidence"), StringComparison.Ordinal);

        // The same rule on board (first test) fired before that frame was even taken.
        var (_, board) = await MissionHarness.RunAsync(OnboardScenarios.DepthRule("board", OneSecond));
        Assert.True(board.OfKind("rule.fired").Single().Time.SecondsSinceEpoch < t1);
    }

    [Fact]
    public async Task A_depth_sensor_bias_moves_the_crossing_by_the_bias_over_the_speed()
    {
        const double biasM = 0.01;
        var bias = $"""
              - name: depth-offset
                kind: sensor_bias
                point: probe.depth
                value: {biasM} m
                at: 1 d

            """;
        var (_, plain) = await MissionHarness.RunAsync(OnboardScenarios.DepthRule("board", OneSecond));
        var (_, biased) = await MissionHarness.RunAsync(OnboardScenarios.DepthRule("board", OneSecond, bias));
        var plainS = plain.OfKind("rule.fired").Single().Time.SecondsSinceEpoch;
        var biasedS = biased.OfKind("rule.fired").Single().Time.SecondsSinceEpoch;

        // Both crossings fall between the same two frames, where the depth moves at one speed (the frames of a run
        // whose rule acts only hours later, on the ground: the same physics up to the firings).
        var (_, ground) = await MissionHarness.RunAsync(OnboardScenarios.DepthRule("ground", null));
        var (t0, d0, t1, d1) = Bracket(Frames(ground));
        Assert.InRange(plainS, t0, t1);
        Assert.InRange(biasedS, t0, t1);
        var speed = (d1 - d0) / (t1 - t0);
        // A reading biased by b crosses the limit when the truth is at limit - b: b / speed earlier (two ticks of rounding).
        Assert.InRange(plainS - biasedS - (biasM / speed), -2e-6, 2e-6);
        var seen = CollectingSink.TextField(biased.OfKind("rule.fired").Single(), "evidence");
        Assert.Contains("(crossing)", seen, StringComparison.Ordinal);
    }

    [Fact]
    public async Task At_samples_the_rule_fires_at_the_first_sample_past_the_crossing()
    {
        var (_, exact) = await MissionHarness.RunAsync(OnboardScenarios.DepthRule("board", OneSecond));
        var (_, sampled) = await MissionHarness.RunAsync(OnboardScenarios.DepthRule("board", "onboard_sampling:\n  interval: 1 min\n  crossings: at_samples\n\n"));
        var exactS = exact.OfKind("rule.fired").Single().Time.SecondsSinceEpoch;
        var sampledS = sampled.OfKind("rule.fired").Single().Time.SecondsSinceEpoch;
        Assert.Equal(Math.Ceiling(exactS / 60) * 60, sampledS);
        Assert.Contains("(sample)", CollectingSink.TextField(sampled.OfKind("rule.fired").Single(), "evidence"), StringComparison.Ordinal);
    }

    [Fact]
    public async Task Samples_are_not_journaled()
    {
        var (_, board) = await MissionHarness.RunAsync(OnboardScenarios.DepthRule("board", OneSecond));
        var (_, ground) = await MissionHarness.RunAsync(OnboardScenarios.DepthRule("ground", null));
        // The same records but the rule's own and what its earlier command changed: no record per sample.
        Assert.InRange(board.Records.Count, ground.Records.Count - 50, ground.Records.Count + 50);
        Assert.Equal(ground.OfKind("probe.telemetry").Count(), board.OfKind("probe.telemetry").Count());
    }

    private static List<(double T, double D)> Frames(CollectingSink sink) =>
        [.. sink.OfKind("probe.telemetry").Select(r => (r.Time.SecondsSinceEpoch, CollectingSink.Field(r, "depth_m")))];

    /// <summary>The last frame not past the limit and the first past it.</summary>
    private static (double T0, double D0, double T1, double D1) Bracket(List<(double T, double D)> frames)
    {
        var i = frames.Select((f, k) => (f, k)).First(x => x.f.D > LimitM).k;
        return (frames[i - 1].T, frames[i - 1].D, frames[i].T, frames[i].D);
    }
}
