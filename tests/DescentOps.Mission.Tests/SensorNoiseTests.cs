namespace DescentOps.Mission.Tests;

/// <summary>A noisy sensor: its readings scatter around the truth with the given standard deviation, only while the fault lasts.</summary>
public sealed class SensorNoiseTests
{
    [Fact]
    public async Task A_noisy_depth_sensor_scatters_with_its_standard_deviation_and_only_during_the_fault()
    {
        var scenario = MissionHarness.Edited(
            ("""
              - name: bus-sag-day-30
                kind: power_dip
                at: 30 d
                duration: 12 h
                remaining_fraction: 0.7
            """, """
              - name: jittery-depth
                kind: sensor_noise
                point: probe.depth
                value: 2 m
                at: 1 d
                duration: 10 d
            """),
            ("until: 400 d", "until: 14 d"));
        var (_, sink) = await MissionHarness.RunAsync(scenario);

        // The truth of each frame (probe.telemetry) against what reached the ground (ground.telemetry), frame by frame.
        var truth = sink.OfKind("probe.telemetry").ToDictionary(r => CollectingSink.IntegerField(r, "frame"), r => (r.Time.SecondsSinceEpoch, Depth: CollectingSink.Field(r, "depth_m")));
        var errors = new List<double>();
        foreach (var seen in sink.OfKind("ground.telemetry"))
        {
            var (sampledS, trueDepth) = truth[CollectingSink.IntegerField(seen, "frame")];
            var error = CollectingSink.Field(seen, "depth_m") - trueDepth;
            // A frame sampled in the very instant the fault starts or ends may see either side of it: skip those two.
            if (sampledS is > 86_400 and < 11 * 86_400) errors.Add(error);
            else if (sampledS is < 86_400 or > 11 * 86_400) Assert.Equal(0.0, error);
        }

        // n ≈ 1440 frames of 10 minutes. For normal noise the sample mean lies within 4 σ/√n and the sample standard
        // deviation within 4 σ/√(2n) of σ = 2 m (computed: usual large-sample standard errors, 4 of them).
        var n = errors.Count;
        Assert.InRange(n, 1400, 1441);
        var mean = errors.Average();
        var sd = Math.Sqrt(errors.Sum(e => (e - mean) * (e - mean)) / (n - 1));
        Assert.InRange(mean, -4 * 2 / Math.Sqrt(n), 4 * 2 / Math.Sqrt(n));
        Assert.InRange(sd, 2 - (4 * 2 / Math.Sqrt(2 * n)), 2 + (4 * 2 / Math.Sqrt(2 * n)));
    }
}
