using DescentOps.Primitives.Identity;
using DescentOps.Rules.Catalogue;
using DescentOps.Rules.Checking;
using DescentOps.Rules.Compiled;
using DescentOps.Rules.Text;
using DescentOps.Scenarios.Loading;
using DescentOps.Scenarios.Model;

namespace DescentOps.Mission.Autonomy;

/// <summary>
/// The mission's own rules across its landers (a scenario's <c>mission_rules</c>): checked against a catalogue that
/// holds every lander's points and command targets, each named "LANDER/name", so a rule can watch one lander, take one
/// lander's point from another's, and command the lander it names. They run on the ground only; errors are located in
/// the scenario file like the rules section's.
/// </summary>
public static class MissionDeskRules
{
    /// <summary>
    /// Every lander's catalogue with its names qualified by the lander. The station's ground-only points are left out:
    /// the mission desk hears the landers' frames, not their carriers.
    /// </summary>
    public static TelemetryCatalogue Catalogue(Scenario scenario)
    {
        var points = new List<TelemetryPointSpec>();
        var commands = new List<CommandSpec>();
        foreach (var lander in scenario.Landers)
        {
            var own = MissionCatalogue.For(lander.View);
            points.AddRange(own.Points.Where(p => !p.GroundOnly).Select(p => p with { Name = Qualified(lander.Name, p.Name) }));
            foreach (var target in TargetsOf(lander.View))
            {
                foreach (var name in own.CommandsOf(target))
                {
                    var spec = own.FindCommand(target, name)!;
                    commands.Add(spec with { Target = new ComponentId(Qualified(lander.Name, target)) });
                }
            }
        }

        return new TelemetryCatalogue(points, commands) { Landers = new HashSet<string>(scenario.Landers.Select(l => l.Name), StringComparer.Ordinal) };
    }

    /// <summary>The command targets of one lander's catalogue, in a fixed order.</summary>
    private static IEnumerable<string> TargetsOf(Scenario view) =>
        new[] { MissionCatalogue.Head, MissionCatalogue.Wall, MissionIds.Probe.Name, MissionCatalogue.Bus, MissionCatalogue.Jets }
            .Concat(view.Vehicles.Select(v => MissionIds.Vehicle(v.Name).Name));

    /// <summary>"LANDER/name".</summary>
    public static string Qualified(string lander, string name) => lander + LanderIds.Separator + name;

    /// <summary>The mission rules against the qualified catalogue; a rule placed on board is refused at its line.</summary>
    public static RuleCheckResult Check(Scenario scenario)
    {
        var result = RuleChecker.CheckSource(new RuleSource(scenario.SourceName, scenario.MissionRules.Text), Catalogue(scenario));
        if (result.RuleSet is not { } set) return result;
        var onBoard = set.Rules.Where(r => r.Placement == Rules.Syntax.Placement.Board)
            .Select(r => new RuleDiagnostic(r.Location, DiagnosticSeverity.Error, DiagnosticCode.PlacementNotAllowed,
                $"mission rule '{r.Name}' runs on board: mission rules run at the ground, where every lander's frames arrive; a lander's own rules may run on board"))
            .ToList();
        return onBoard.Count == 0 ? result : result with { Errors = [.. result.Errors, .. onBoard], RuleSet = null };
    }

    /// <summary>The checked mission rules (empty when the scenario has none); a bad one is thrown as located scenario errors.</summary>
    public static CompiledRuleSet Compile(Scenario scenario)
    {
        if (scenario.MissionRules.IsEmpty) return MissionRules.Empty;
        var result = Check(scenario);
        if (result.RuleSet is { } rules) return rules;
        throw new ScenarioException([.. result.Errors.Select(e => new ScenarioError(
            scenario.MissionRules.InFile(e.Location.Line, e.Location.Column), "mission_rules", $"{e.Code}: {e.Message}"))]);
    }

    /// <summary>A mission rule's command split into the lander it goes to and the command as that lander's station knows it.</summary>
    public static (string Lander, CommandAction Command) Route(CommandAction command)
    {
        var name = command.Target.Name;
        var at = name.IndexOf(LanderIds.Separator, StringComparison.Ordinal);
        if (at <= 0) throw new ArgumentException($"'{name}' names no lander.", nameof(command));
        return (name[..at], command with { Target = new ComponentId(name[(at + 1)..]) });
    }
}
