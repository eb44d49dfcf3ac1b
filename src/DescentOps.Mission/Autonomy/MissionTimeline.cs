using DescentOps.Rules.Checking;
using DescentOps.Rules.Compiled;
using DescentOps.Rules.Syntax;
using DescentOps.Rules.Text;
using DescentOps.Scenarios.Loading;
using DescentOps.Scenarios.Model;
using SourceLocation = DescentOps.Scenarios.Loading.SourceLocation;

namespace DescentOps.Mission.Autonomy;

/// <summary>
/// What a scenario does at set times besides its faults: time-tagged telecommands, checked against the mission's
/// catalogue as a rule's send is, and rule sets uplinked during the run, checked as a scenario's rules are. Errors
/// are scenario errors at the place of the command or the rule in its file.
/// </summary>
public static class MissionTimeline
{
    /// <summary>The uplink command's target and name: the probe hands it to its autonomy, which loads the set.</summary>
    public const string LoadRulesCommand = "load_rules";

    public static IReadOnlyList<ScenarioError> Errors(Scenario scenario)
    {
        // Each lander's telecommands are checked against its own mission (the view the run compiles them from).
        if (scenario.Landers.Count > 0) return [.. scenario.Landers.SelectMany(l => Errors(l.View)).Distinct()];
        var errors = new List<ScenarioError>();
        _ = Telecommands(scenario, errors);
        _ = Uplinks(scenario, errors);
        return errors;
    }

    public static IReadOnlyList<TimedTelecommand> CompileTelecommands(Scenario scenario) => Throwing(errors => Telecommands(scenario, errors));

    public static IReadOnlyList<CompiledRuleSet> CompileUplinks(Scenario scenario) => Throwing(errors => Uplinks(scenario, errors));

    /// <summary>The telecommand that carries uplink <paramref name="index"/> to the probe.</summary>
    public static CommandAction LoadRules(int index) =>
        new(MissionIds.Autonomy, LoadRulesCommand, [new CommandArgument("uplink", index, null)]);

    private static T Throwing<T>(Func<List<ScenarioError>, T> compile)
    {
        var errors = new List<ScenarioError>();
        var result = compile(errors);
        return errors.Count > 0 ? throw new ScenarioException(errors) : result;
    }

    private static List<TimedTelecommand> Telecommands(Scenario scenario, List<ScenarioError> errors)
    {
        var compiled = new List<TimedTelecommand>();
        if (scenario.Telecommands.Count == 0) return compiled;
        var catalogue = MissionCatalogue.For(scenario);
        foreach (var t in scenario.Telecommands)
        {
            var (command, problems) = RuleChecker.CheckCommand(new RuleSource(t.SendLocation.File, t.Send), catalogue);
            foreach (var p in problems)
            {
                // The command is one line of text starting at the field's value.
                var at = new SourceLocation(t.SendLocation.File, t.SendLocation.Line + p.Location.Line - 1, t.SendLocation.Column + p.Location.Column - 1);
                errors.Add(new ScenarioError(at, t.FieldPath + ".send", $"{p.Code}: {p.Message}"));
            }

            if (command is not null) compiled.Add(new TimedTelecommand(t.AtS, t.From, command, t.FieldPath));
        }

        return compiled;
    }

    private static List<CompiledRuleSet> Uplinks(Scenario scenario, List<ScenarioError> errors)
    {
        var compiled = new List<CompiledRuleSet>();
        if (scenario.RuleUplinks.Count == 0) return compiled;
        var catalogue = MissionCatalogue.For(scenario);
        var initialBoard = MissionRules.Check(scenario).RuleSet?.Rules.Any(r => r.Placement == Placement.Board) ?? false;
        foreach (var uplink in scenario.RuleUplinks)
        {
            var result = RuleChecker.CheckSource(new RuleSource(uplink.Rules.FirstLine.File, uplink.Rules.Text), catalogue);
            foreach (var e in result.Errors)
            {
                errors.Add(new ScenarioError(uplink.Rules.InFile(e.Location.Line, e.Location.Column), uplink.FieldPath + ".rules", $"{e.Code}: {e.Message}"));
            }

            if (result.RuleSet is not { } set) continue;
            if (scenario.OnboardSampling is not null && (initialBoard || set.Rules.Any(r => r.Placement == Placement.Board)))
            {
                // The on-board sampler plans its readings from the rules it starts with; a new set would need a new plan.
                errors.Add(new ScenarioError(uplink.Rules.FirstLine, uplink.FieldPath, "a rule set cannot be uplinked to the probe while 'onboard_sampling' plans its readings from the first set; uplink ground rules only, or leave out onboard_sampling"));
                continue;
            }

            compiled.Add(set);
        }

        return compiled;
    }
}
