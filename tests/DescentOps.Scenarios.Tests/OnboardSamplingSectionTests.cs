using DescentOps.Scenarios.Loading;

namespace DescentOps.Scenarios.Tests;

/// <summary>The onboard_sampling section: a point's entry wins over its group's, which wins over the section's interval.</summary>
public sealed class OnboardSamplingSectionTests
{
    [Fact]
    public void A_point_wins_over_its_group_and_the_group_over_the_section_interval()
    {
        var sampling = ScenarioLoader.LoadText(ScenarioText.Default, "every-field.yaml").OnboardSampling!;
        Assert.True(sampling.ExactCrossings);
        Assert.Equal(1.0, sampling.IntervalOf("probe.depth", 600));
        Assert.Equal(5.0, sampling.IntervalOf("probe.tilt", 600));
        Assert.Equal(30.0, sampling.IntervalOf("probe.battery_soc", 600));
    }

    [Fact]
    public void Without_an_interval_a_point_is_sampled_with_the_frames()
    {
        var text = ScenarioText.DefaultWith("  interval: 30 s\n  crossings: exact\n", "  crossings: at_samples\n");
        var sampling = ScenarioLoader.LoadText(text, "x.yaml").OnboardSampling!;
        Assert.False(sampling.ExactCrossings);
        Assert.Equal(600.0, sampling.IntervalOf("probe.regime", 600));
    }

    [Fact]
    public void A_name_given_twice_or_unknown_is_refused_at_its_place()
    {
        var twice = ScenarioText.DefaultWith("    - { name: probe.depth, interval: 1 s }", "    - { name: probe.depth, interval: 1 s }\n    - { name: probe.depth, interval: 2 s }");
        var error = Assert.Throws<ScenarioException>(() => ScenarioLoader.LoadText(twice, "x.yaml")).Errors.Single();
        Assert.Equal("onboard_sampling.points[2].name", error.FieldPath);
        Assert.Equal(ScenarioText.LineOf(twice, "interval: 2 s"), error.Location.Line);

        var unknown = ScenarioText.DefaultWith("{ name: probe.depth, interval: 1 s }", "{ name: probe.colour, interval: 1 s }");
        Assert.Throws<ScenarioException>(() => ScenarioLoader.LoadText(unknown, "x.yaml"));
    }
}
