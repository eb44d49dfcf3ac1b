using DescentOps.Mission.Running;
using DescentOps.Scenarios.Loading;
using DescentOps.Scenarios.Model;

namespace DescentOps.Mission.Tests;

/// <summary>
/// Faults that start on a condition of the probe's true state, or at random from the run's seeded stream.
/// </summary>
public sealed class FaultTriggerTests
{
    private const string ScheduledDip = """
          - name: bus-sag-day-30
            kind: power_dip
            at: 30 d
            duration: 12 h
            remaining_fraction: 0.7
        """;

    private static Scenario WithFaults(string faults, string until = "400 d") =>
        MissionHarness.Edited(
            (ScheduledDip, faults),
            ("until: 400 d", "until: " + until));

    private static IReadOnlyList<double> DrawnStartsS(CollectingSink sink, string fault) =>
        [.. sink.OfKind("fault.drawn").Where(r => CollectingSink.TextField(r, "fault") == fault).SelectMany(r => CollectingSink.NumbersField(r, "starts_s"))];

    [Fact]
    public async Task A_condition_trigger_fires_on_the_first_frame_completing_its_persistence_on_the_true_state()
    {
        var scenario = WithFaults("""
              - name: warm-ice-sag
                kind: power_dip
                when: (probe.ice_temperature above 200 K and probe.depth above 1 km) for 30 min
                duration: 6 h
                remaining_fraction: 0.3
              - name: lying-depth
                kind: sensor_stuck
                point: probe.depth
                value: 0 m
                at: 1 h
            """);
        var (_, sink) = await MissionHarness.RunAsync(scenario);

        // Computed from the log itself: in the probe's true frames ('probe.telemetry'), the first frame on which both
        // limits hold starts the episode; held for 30 min, the trigger fires half an hour later, between frames. The depth
        // sensor is stuck at 0 m from hour 1, so a trigger reading the sensors would never fire: faults act on what is.
        var first = sink.OfKind("probe.telemetry").First(f =>
            CollectingSink.Field(f, "ice_temperature_k") > 200 && CollectingSink.Field(f, "depth_m") > 1000);
        double? expected = first.Time.SecondsSinceEpoch + 1800;

        var triggered = Assert.Single(sink.OfKind("fault.triggered"));
        Assert.NotNull(expected);
        Assert.Equal(expected.Value, triggered.Time.SecondsSinceEpoch);
        var injected = sink.OfKind("fault.injected").Single(r => r.Fields.Single(f => f.Name == "fault").Text == "warm-ice-sag");
        Assert.Equal(expected.Value, injected.Time.SecondsSinceEpoch);
        Assert.Contains("probe.depth=", triggered.Fields.Single(f => f.Name == "evidence").Text!, StringComparison.Ordinal);
    }

    [Fact]
    public async Task Random_occurrences_are_drawn_from_the_seed_and_never_overlap()
    {
        var faults = """
              - name: random-sag
                kind: power_dip
                mean_interval: 20 d
                not_before: 5 d
                occurrences: 4
                duration: 2 h
                remaining_fraction: 0.5
            """;
        var scenario = WithFaults(faults, "1 s");
        var (_, first) = await MissionHarness.RunAsync(scenario, seed: 7);
        var (_, again) = await MissionHarness.RunAsync(scenario, seed: 7);
        var (_, other) = await MissionHarness.RunAsync(scenario, seed: 8);

        var starts = DrawnStartsS(first, "random-sag");
        Assert.Equal(4, starts.Count);
        Assert.Equal(starts, DrawnStartsS(again, "random-sag"));
        Assert.NotEqual(starts, DrawnStartsS(other, "random-sag"));
        Assert.True(starts[0] >= 5 * 86_400);
        for (var k = 1; k < starts.Count; k++) Assert.True(starts[k] > starts[k - 1] + 7200, "an occurrence begins only after the previous one ended");
    }

    [Fact]
    public async Task Random_intervals_follow_the_exponential_distribution_of_their_mean()
    {
        // 1000 occurrences of a 1 s fault with a mean interval of 1 d. For an exponential law the standard deviation
        // equals the mean, so the sample mean of n = 1000 gaps lies within 4 standard errors (4 / sqrt(1000) = 12.6 %)
        // of 1 d except with probability ~6e-5; the share of gaps below the median ln 2 d is 1/2 within 4 * 0.5 / sqrt(n)
        // (computed from the exponential distribution; the bounds are the usual normal approximation).
        var faults = """
              - name: flicker
                kind: power_dip
                mean_interval: 1 d
                occurrences: 1000
                duration: 1 s
                remaining_fraction: 0.9
            """;
        var (_, sink) = await MissionHarness.RunAsync(WithFaults(faults, "1 s"));
        var starts = DrawnStartsS(sink, "flicker");
        var gaps = starts.Zip(starts.Skip(1), (a, b) => b - a - 1.0).Prepend(starts[0]).Select(g => g / 86_400).ToList();

        Assert.Equal(1000, gaps.Count);
        Assert.InRange(gaps.Average(), 1 - 0.126, 1 + 0.126);
        Assert.InRange(gaps.Count(g => g < Math.Log(2)) / 1000.0, 0.5 - 0.063, 0.5 + 0.063);
    }

    [Theory]
    [InlineData("probe.depht above 1 km", "unknown")]
    [InlineData("probe.depth above 5 kW", "unit")]
    public void A_bad_condition_is_refused_at_its_place_in_the_scenario_file(string condition, string expected)
    {
        var scenario = WithFaults($"""
              - name: bad-trigger
                kind: power_dip
                when: {condition}
                duration: 1 h
                remaining_fraction: 0.5
            """);
        var error = Assert.Single(Assert.Throws<ScenarioException>(() => MissionAssembly.Components(scenario)).Errors);

        var line = scenario.SourceText.Split('\n').Select((l, i) => (l, i)).Single(x => x.l.Contains("when: ", StringComparison.Ordinal));
        Assert.Equal(line.i + 1, error.Location.Line);
        // The error points inside the condition, at or after its first character.
        Assert.True(error.Location.Column >= line.l.IndexOf("probe", StringComparison.Ordinal) + 1);
        Assert.Equal("faults[0].when", error.FieldPath);
        Assert.Contains(expected, error.Message, StringComparison.OrdinalIgnoreCase);
    }

    [Theory]
    [InlineData("at: 3 d\n    when: probe.depth above 1 km", "exactly one trigger")]
    [InlineData("at: 3 d\n    occurrences: 2", "belong to a random trigger")]
    [InlineData("mean_interval: 3 d\n    occurrences: 2", "happens once")]
    public void Trigger_fields_that_contradict_each_other_are_refused(string trigger, string expected)
    {
        var text = MissionHarness.DefaultText.Replace(
            ScheduledDip,
            $"  - name: odd\n    kind: tether_break\n    {trigger}",
            StringComparison.Ordinal);
        var errors = Assert.Throws<ScenarioException>(() => ScenarioLoader.LoadText(text, "odd.yaml")).Errors;
        Assert.Contains(errors, e => e.Message.Contains(expected, StringComparison.Ordinal));
    }
}
