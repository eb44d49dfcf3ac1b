using DescentOps.Mission.Autonomy;
using DescentOps.Mission.Faults;
using DescentOps.Scenarios;
using DescentOps.Scenarios.Loading;
using DescentOps.Tests.Shared;

namespace DescentOps.Mission.Tests;

/// <summary>A rule error is reported where its text stands in the scenario file, whatever YAML style holds the rules.</summary>
public sealed class EmbeddedRuleLocationTests
{
    private const string Rule = "rule r { runs on board severity high when probe.tail_temp above 300 K then { send probe pause_descent } }";

    private static string WithRules(string rulesYaml) =>
        TestScenario.Default.InsertBefore("\nrun:\n", "\n" + rulesYaml).Text;

    [Theory]
    [InlineData("rules: |\n  autonomy E3\n  " + Rule)]
    [InlineData("rules: |4\n      autonomy E3\n    " + Rule)]
    [InlineData("rules: >\n  autonomy E3\n\n  rule r { runs on board severity high\n    when probe.tail_temp above 300 K\n    then { send probe pause_descent } }")]
    [InlineData("rules: \"autonomy E3\\n" + Rule + "\"")]
    [InlineData("rules: 'autonomy E3\n\n  " + Rule + "'")]
    public void The_unknown_point_is_located_at_its_place_in_the_file(string rulesYaml)
    {
        var text = WithRules(rulesYaml);
        var scenario = ScenarioLoader.LoadText(text, "rules.yaml");
        var error = Assert.Single(MissionRules.Check(scenario).Errors);
        var at = scenario.Rules.InFile(error.Location.Line, error.Location.Column);
        var lines = text.Split('\n');
        var line = Array.FindIndex(lines, l => l.Contains("probe.tail_temp", StringComparison.Ordinal));
        Assert.Equal((line + 1, lines[line].IndexOf("probe.tail_temp", StringComparison.Ordinal) + 1), (at.Line, at.Column));
    }

    [Fact]
    public void A_trigger_condition_cannot_close_itself_and_open_a_rule()
    {
        var text = BuiltInScenarios.Text("default.yaml").Replace(
            "    at: 30 d\n",
            "    when: \"probe.depth above 1 km then { disable trigger } } rule evil { runs on board severity high when probe.depth above 0 m then { send probe enter_safe_mode }\"\n",
            StringComparison.Ordinal);
        var scenario = ScenarioLoader.LoadText(text, "inject.yaml");
        var error = Assert.Single(FaultConditions.Check(scenario, out var compiled));
        Assert.Empty(compiled);
        Assert.Equal("faults[0].when", error.FieldPath);
        Assert.Contains("holds no '{'", error.Message, StringComparison.Ordinal);
    }
}
