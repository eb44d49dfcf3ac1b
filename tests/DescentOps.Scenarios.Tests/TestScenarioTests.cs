using DescentOps.Tests.Shared;

namespace DescentOps.Scenarios.Tests;

/// <summary>The test scenarios' editor: edits apply where they say, or fail the test naming what is missing.</summary>
public sealed class TestScenarioTests
{
    private const string Nested = "probe:\n  name: P\n  radius: 12 cm # the hull\n  heaters:\n    head: 6 kW\n    wall: 1 kW\nstation:\n  radius: 3 m\nrun:\n  until: 10 d\n";

    [Fact]
    public void Set_changes_the_value_at_its_key_path_and_keeps_every_other_line()
    {
        var edited = TestScenario.Of(Nested, "n.yaml").Set("probe.heaters.wall", "2 kW").Set("station.radius", "4 m");
        Assert.Equal(Nested.Replace("wall: 1 kW", "wall: 2 kW", StringComparison.Ordinal).Replace("radius: 3 m", "radius: 4 m", StringComparison.Ordinal), edited.Text);
    }

    [Fact]
    public void A_key_is_looked_up_only_inside_the_block_of_the_key_before_it()
    {
        // "radius" exists under station, but not under probe.heaters: the path must not wander into the next block.
        var text = TestScenario.Of(Nested, "n.yaml");
        var error = Assert.Throws<TestScenarioException>(() => text.Set("probe.heaters.radius", "1 m"));
        Assert.Contains("n.yaml: no key 'radius' on the path 'probe.heaters.radius'", error.Message, StringComparison.Ordinal);
        Assert.Throws<TestScenarioException>(() => text.Set("probe.heaters", "1 m"));
    }

    [Fact]
    public void Replace_needs_its_anchor_exactly_once()
    {
        var text = TestScenario.Of(Nested, "n.yaml");
        Assert.Contains("does not occur", Assert.Throws<TestScenarioException>(() => text.Replace("radius: 99 m", "x")).Message, StringComparison.Ordinal);
        Assert.Contains("more than once", Assert.Throws<TestScenarioException>(() => text.Replace("radius:", "x")).Message, StringComparison.Ordinal);
        Assert.Equal(Nested.Replace("until: 10 d", "until: 2 d", StringComparison.Ordinal), text.Replace("until: 10 d", "until: 2 d").Text);
    }

    [Fact]
    public void A_section_is_added_before_run_and_only_once()
    {
        var text = TestScenario.Of(Nested, "n.yaml").AddSection("rules: |\n  when probe.depth above 5 m then log x");
        Assert.Contains("    wall: 1 kW\nstation:\n  radius: 3 m\nrules: |\n  when probe.depth above 5 m then log x\nrun:\n", text.Text, StringComparison.Ordinal);
        Assert.Throws<TestScenarioException>(() => text.AddSection("rules: |\n  x"));
        Assert.Throws<TestScenarioException>(() => text.AddSection("  indented: 1"));
    }

    [Fact]
    public void The_default_scenario_edited_by_path_loads_with_the_new_value()
    {
        var scenario = TestScenario.Default.Set("run.until", "3 d").Set("probe.head_power", "5 kW").Load();
        Assert.Equal(3 * 86_400.0, scenario.Run.UntilS, 6);
        Assert.Equal(5000.0, scenario.Probe.HeadPowerW, 9);
    }
}
