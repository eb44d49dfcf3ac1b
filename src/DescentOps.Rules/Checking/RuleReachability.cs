using DescentOps.Rules.Catalogue;
using DescentOps.Rules.Compiled;
using DescentOps.Rules.Syntax;
using DescentOps.Rules.Text;

namespace DescentOps.Rules.Checking;

/// <summary>Warnings about rules that can never act: a condition no telemetry satisfies, or a rule nothing that can fire enables.</summary>
internal sealed class RuleReachability
{
    private readonly TelemetryCatalogue _catalogue;
    private readonly DiagnosticList _diagnostics;

    public RuleReachability(TelemetryCatalogue catalogue, DiagnosticList diagnostics)
    {
        _catalogue = catalogue;
        _diagnostics = diagnostics;
    }

    internal void Warn(RuleSetSyntax tree, IReadOnlyList<CompiledRule> compiled)
    {
        var neverFires = new HashSet<string>(StringComparer.Ordinal);
        var conditionAt = new Dictionary<string, SourceLocation>(StringComparer.Ordinal);
        foreach (var syntax in tree.Rules)
        {
            if (syntax.Condition is { } condition) conditionAt.TryAdd(syntax.Name.Text, condition.Location);
        }

        foreach (var rule in compiled)
        {
            if (BoundsAnalysis.CanNeverHold(rule.Condition, _catalogue))
            {
                neverFires.Add(rule.Name);
                var at = conditionAt.GetValueOrDefault(rule.Name, rule.Location);
                _diagnostics.Warning(DiagnosticCode.ContradictoryBounds, at, $"rule '{rule.Name}' can never fire: no telemetry satisfies its condition (bounds contradict each other or the physical range)");
            }
        }

        // A rule can become enabled only through a rule that can itself be enabled and can fire.
        var byName = new Dictionary<string, CompiledRule>(StringComparer.Ordinal);
        foreach (var rule in compiled) byName.TryAdd(rule.Name, rule);
        var enabled = compiled.Where(r => r.StartsEnabled).Select(r => r.Name).ToHashSet(StringComparer.Ordinal);
        var frontier = new Queue<string>(compiled.Where(r => r.StartsEnabled).Select(r => r.Name));
        while (frontier.Count > 0)
        {
            var name = frontier.Dequeue();
            // A rule with errors is not compiled: it cannot enable anything (and is reported already).
            if (!byName.TryGetValue(name, out var rule) || neverFires.Contains(rule.Name))
            {
                continue;
            }

            foreach (var enable in rule.Actions.Concat(rule.Escalations.SelectMany(e => e.Actions)).OfType<EnableAction>())
            {
                if (enabled.Add(enable.Rule))
                {
                    frontier.Enqueue(enable.Rule);
                }
            }
        }

        foreach (var rule in compiled.Where(r => !enabled.Contains(r.Name)))
        {
            _diagnostics.Warning(DiagnosticCode.NeverEnabled, rule.Location, $"rule '{rule.Name}' starts disabled and no rule that can fire enables it");
        }
    }
}
