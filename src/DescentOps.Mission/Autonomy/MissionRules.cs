using DescentOps.Rules.Checking;
using DescentOps.Rules.Compiled;
using DescentOps.Rules.Text;
using DescentOps.Scenarios.Loading;
using DescentOps.Scenarios.Model;

namespace DescentOps.Mission.Autonomy;

/// <summary>
/// Compiles a scenario's rules against the mission's catalogue. Errors are reported at their place in the
/// scenario file (the rules block's own line and column moved by where the block sits), as scenario errors, so
/// a run refuses a bad rule the same way it refuses a bad field.
/// </summary>
public static class MissionRules
{
    public static CompiledRuleSet Empty { get; } = new(null, [], []);

    public static RuleCheckResult Check(Scenario scenario) =>
        RuleChecker.CheckSource(new RuleSource(scenario.SourceName, scenario.Rules.Text), MissionCatalogue.For(scenario));

    public static CompiledRuleSet Compile(Scenario scenario)
    {
        if (scenario.Rules.IsEmpty) return Empty;
        var result = Check(scenario);
        if (result.RuleSet is { } rules) return rules;
        throw new ScenarioException([.. result.Errors.Select(e => new ScenarioError(
            scenario.Rules.InFile(e.Location.Line, e.Location.Column), "rules", $"{e.Code}: {e.Message}"))]);
    }
}
