using DescentOps.Primitives.Time;
using DescentOps.Rules.Catalogue;
using DescentOps.Rules.Compiled;
using DescentOps.Rules.Syntax;
using DescentOps.Rules.Text;

namespace DescentOps.Rules.Checking;

/// <summary>
/// Checks a parsed rule set against the mission's catalogue and, when nothing is wrong, compiles it to SI.
/// Never throws: every problem is a located diagnostic.
/// </summary>
public sealed class RuleChecker
{
    /// <summary>The longest duration a rule may name: far beyond any mission, far inside the tick range.</summary>
    public const double MaxDurationS = 1.0e10;

    private readonly DiagnosticList _diagnostics = new();
    private readonly RuleNames _names;
    private readonly QuantityChecker _quantities;
    private readonly ConditionChecker _conditions;
    private readonly ActionChecker _actions;
    private readonly ExclusionChecker _exclusions;
    private readonly RuleReachability _reachability;

    private RuleChecker(TelemetryCatalogue catalogue, IEnumerable<string> rulesWithErrors)
    {
        _names = new RuleNames(rulesWithErrors, _diagnostics);
        _quantities = new QuantityChecker(_diagnostics);
        _conditions = new ConditionChecker(catalogue, _diagnostics, _quantities);
        _actions = new ActionChecker(catalogue, _diagnostics, _quantities, _names);
        _exclusions = new ExclusionChecker(catalogue, _diagnostics, _names);
        _reachability = new RuleReachability(catalogue, _diagnostics);
    }

    /// <summary>Parses and checks in one step; syntax errors come first in place order with the others.</summary>
    public static RuleCheckResult CheckSource(RuleSource source, TelemetryCatalogue catalogue)
    {
        var parsed = RuleParser.Parse(source);
        return Check(parsed, catalogue);
    }

    /// <summary>
    /// Checks one telecommand written alone ("probe.wall set_power(power = 3 kW)") against the catalogue, as a rule's
    /// send is checked: target, command, arguments, units and ranges. The command is null exactly when there are errors.
    /// </summary>
    public static (CommandAction? Command, IReadOnlyList<RuleDiagnostic> Errors) CheckCommand(RuleSource source, TelemetryCatalogue catalogue)
    {
        var (send, syntaxErrors) = RuleParser.ParseCommand(source);
        if (send is null) return (null, syntaxErrors);
        var checker = new RuleChecker(catalogue, []);
        var compiled = checker._actions.CheckSend(send);
        var errors = checker._diagnostics.Items.Where(d => d.Severity == DiagnosticSeverity.Error).ToArray();
        return (errors.Length == 0 ? compiled?.Command : null, errors);
    }

    public static RuleCheckResult Check(ParseResult parsed, TelemetryCatalogue catalogue)
    {
        var checker = new RuleChecker(catalogue, parsed.RuleSet.RulesWithErrors);
        checker._diagnostics.AddRange(parsed.Errors);
        var compiled = checker.CheckRuleSet(parsed.RuleSet);

        var ordered = checker._diagnostics.Items
            .OrderBy(d => d.Location.Line)
            .ThenBy(d => d.Location.Column)
            .ThenBy(d => d.Code)
            .ThenBy(d => d.Message, StringComparer.Ordinal)
            .ToArray();
        var errors = ordered.Where(d => d.Severity == DiagnosticSeverity.Error).ToArray();
        var warnings = ordered.Where(d => d.Severity == DiagnosticSeverity.Warning).ToArray();
        return new RuleCheckResult(errors, warnings, errors.Length == 0 ? compiled : null);
    }

    private CompiledRuleSet CheckRuleSet(RuleSetSyntax tree)
    {
        foreach (var rule in tree.Rules)
        {
            if (!_names.Declare(rule.Name.Text))
            {
                _diagnostics.Error(DiagnosticCode.DuplicateRule, rule.Name.Location, $"a rule named '{rule.Name.Text}' is already defined");
            }
        }

        var compiledRules = new List<CompiledRule>();
        foreach (var rule in tree.Rules)
        {
            if (CheckRule(rule, tree) is { } compiled)
            {
                compiledRules.Add(compiled);
            }
        }

        var exclusions = tree.Exclusions.Select(_exclusions.Check).OfType<CompiledExclusion>().ToArray();
        _exclusions.CheckConflicts(tree);
        _exclusions.WarnAboutUnused(tree);
        _reachability.Warn(tree, compiledRules);
        return new CompiledRuleSet(tree.Autonomy, compiledRules, exclusions);
    }

    private CompiledRule? CheckRule(RuleSyntax rule, RuleSetSyntax tree)
    {
        if (rule.Placement == Placement.Board && tree.Autonomy is AutonomyLevel.E1 or AutonomyLevel.E2)
        {
            _diagnostics.Error(DiagnosticCode.PlacementNotAllowed, rule.Location,
                $"rule '{rule.Name.Text}' runs on board, which needs event-based autonomy (E3 or E4), but this rule set declares {tree.Autonomy} at line {tree.AutonomyLocation.Line}");
        }

        var cooldown = SimDuration.Zero;
        if (rule.Cooldown is { } cooldownSyntax && _quantities.TryDuration(cooldownSyntax, "a cooldown", allowZero: true) is { } checkedCooldown)
        {
            cooldown = checkedCooldown;
        }

        var condition = rule.Condition is null ? null : _conditions.Check(rule.Condition, rule.Placement);
        var actions = _actions.Check(rule.Actions);
        if (rule.Placement == Placement.Board)
        {
            // The ground team runs procedures; flight software has no one to run them.
            foreach (var start in rule.Actions.Concat(rule.Escalations.SelectMany(e => e.Actions)).OfType<StartSyntax>())
            {
                _diagnostics.Error(DiagnosticCode.PlacementNotAllowed, start.Location, $"rule '{rule.Name.Text}' runs on board and cannot start procedure '{start.Procedure.Text}': procedures are run by the ground team; start it from a ground rule");
            }
        }

        var escalations = new List<CompiledEscalation>();
        foreach (var escalation in rule.Escalations)
        {
            var after = _quantities.TryDuration(escalation.After, "an escalation delay", allowZero: false);
            var steps = _actions.Check(escalation.Actions);
            if (after is { } delay && steps is not null)
            {
                escalations.Add(new CompiledEscalation(delay, steps));
            }
        }

        if (condition is null || actions is null || rule.Placement is not { } placement || rule.Severity is not { } severity)
        {
            return null;
        }

        return new CompiledRule(rule.Name.Text, placement, severity, rule.Priority, cooldown, !rule.StartsDisabled, condition, actions, escalations, rule.Location);
    }
}
