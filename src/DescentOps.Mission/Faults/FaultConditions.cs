using DescentOps.Mission.Autonomy;
using DescentOps.Rules.Checking;
using DescentOps.Rules.Compiled;
using DescentOps.Rules.Text;
using DescentOps.Scenarios.Loading;
using SourceLocation = DescentOps.Scenarios.Loading.SourceLocation;
using DescentOps.Scenarios.Model;

namespace DescentOps.Mission.Faults;

/// <summary>
/// Compiles each fault's <c>when</c> trigger as a one-rule set of the rule language, checked against the mission's
/// catalogue. A trigger condition thus has exactly the rules' syntax, units, persistence and range checks, and its
/// errors are reported at their place in the scenario file. The rule disables itself when it fires: a trigger fires once.
/// </summary>
public static class FaultConditions
{
    internal const string RuleName = "trigger";

    private const string ConditionPrefix = "when ";

    /// <summary>The line of the wrapper text that holds the condition (1-based).</summary>
    private const int ConditionLine = 4;

    /// <summary>The compiled trigger of every fault that has one, by the fault's index; located errors are thrown.</summary>
    public static IReadOnlyDictionary<int, CompiledRuleSet> Compile(Scenario scenario)
    {
        var errors = Check(scenario, out var compiled);
        return errors.Count > 0 ? throw new ScenarioException(errors) : compiled;
    }

    /// <summary>The located errors of every trigger condition (for <c>descentops check</c> and the run alike).</summary>
    public static IReadOnlyList<ScenarioError> Check(Scenario scenario, out IReadOnlyDictionary<int, CompiledRuleSet> compiled)
    {
        var catalogue = MissionCatalogue.For(scenario).ForFaultTriggers();
        var sets = new Dictionary<int, CompiledRuleSet>();
        var errors = new List<ScenarioError>();
        for (var i = 0; i < scenario.Faults.Count; i++)
        {
            var fault = scenario.Faults[i];
            if (fault.Start is not FaultStart.OnCondition { When: var condition } start) continue;
            // Braces would close the wrapper's condition and open rule text of the author's own (a second rule, actions).
            var brace = condition.IndexOfAny(['{', '}']);
            if (brace >= 0)
            {
                errors.Add(new ScenarioError(Locate(scenario, start.WhenAt, ConditionLine, ConditionPrefix.Length + brace + 1), $"faults[{i}].when", $"a condition holds no '{condition[brace]}': a trigger is one condition, not rule text"));
                continue;
            }

            var result = RuleChecker.CheckSource(new RuleSource(scenario.SourceName, Wrap(condition)), catalogue);
            if (result.RuleSet is { Rules.Count: 1, Exclusions.Count: 0 } rules)
            {
                sets[i] = rules;
                continue;
            }

            errors.AddRange(result.Errors.Select(e => new ScenarioError(
                Locate(scenario, start.WhenAt, e.Location.Line, e.Location.Column), $"faults[{i}].when", $"{e.Code}: {e.Message}")));
        }

        compiled = sets;
        return errors;
    }

    /// <summary>The condition inside a rule that watches on board (fresh, true samples) and disables itself on firing.</summary>
    private static string Wrap(string condition) =>
        $"rule {RuleName} {{\nruns on board\nseverity info\n{ConditionPrefix}{condition.ReplaceLineEndings(" ")}\nthen {{ disable {RuleName} }}\n}}\n";

    /// <summary>
    /// Maps a place in the wrapper to the scenario file: on the condition's line, the column moves by where the value
    /// starts (one more for a quoted value); anything else (an unclosed brace the condition opened) is the value's start.
    /// </summary>
    private static SourceLocation Locate(Scenario scenario, SourceLocation at, int line, int column)
    {
        if (line != ConditionLine || column <= ConditionPrefix.Length) return at;
        var lines = scenario.SourceText.Split('\n');
        var text = at.Line - 1 < lines.Length ? lines[at.Line - 1] : "";
        var quoted = at.Column - 1 < text.Length && text[at.Column - 1] is '"' or '\'';
        return at with { Column = at.Column + column - ConditionPrefix.Length - 1 + (quoted ? 1 : 0) };
    }
}
