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

    public static RuleCheckResult Check(Scenario scenario)
    {
        var result = RuleChecker.CheckSource(new RuleSource(scenario.SourceName, scenario.Rules.Text), MissionCatalogue.For(scenario));
        if (scenario.OnboardSampling is null || result.RuleSet is not { } set) return result;
        // The on-board sampler reads the probe's sensors, not the link's or the power controller's reports, which come with the frames.
        var frameOnly = set.Rules.Where(r => r.Placement == Rules.Syntax.Placement.Board)
            .SelectMany(r => r.Condition.Points)
            .FirstOrDefault(p => p == "probe.link_path" || Probe.ProbeLoadStates.IsLoadPoint(p));
        if (frameOnly is null) return result;
        var text = scenario.Rules.Text;
        var at = text.IndexOf(frameOnly, StringComparison.Ordinal);
        var line = text[..Math.Max(at, 0)].Count(c => c == '\n') + 1;
        var column = at - (text.LastIndexOf('\n', Math.Max(at - 1, 0)) + 1) + 1;
        var error = new RuleDiagnostic(new Rules.Text.SourceLocation(scenario.SourceName, line, column), DiagnosticSeverity.Error, DiagnosticCode.UnknownPoint,
            $"on-board rules cannot read '{frameOnly}' with onboard_sampling: the on-board sampler reads the probe's sensors, and {(frameOnly == "probe.link_path" ? "the link path comes" : "a load's state comes")} with the frames");
        return result with { Errors = [.. result.Errors, error], RuleSet = null };
    }

    public static CompiledRuleSet Compile(Scenario scenario)
    {
        // With landers, every lander's rules are compiled now, so a bad rule of any lander stops the run before it starts;
        // the scenario's own rules are its first lander's.
        foreach (var lander in scenario.Landers.Skip(1)) _ = Compile(lander.View);
        _ = MissionDeskRules.Compile(scenario);
        if (scenario.Rules.IsEmpty) return Empty;
        var result = Check(scenario);
        if (result.RuleSet is { } rules) return rules;
        throw new ScenarioException([.. result.Errors.Select(e => new ScenarioError(
            scenario.Rules.InFile(e.Location.Line, e.Location.Column), "rules", $"{e.Code}: {e.Message}"))]);
    }
}
