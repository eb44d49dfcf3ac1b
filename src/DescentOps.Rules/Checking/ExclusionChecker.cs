using DescentOps.Primitives.Identity;
using DescentOps.Rules.Catalogue;
using DescentOps.Rules.Compiled;
using DescentOps.Rules.Syntax;
using DescentOps.Rules.Text;

namespace DescentOps.Rules.Checking;

/// <summary>'exclusive' blocks, and rules that command one actuator at one priority with no block between them.</summary>
internal sealed class ExclusionChecker
{
    private readonly TelemetryCatalogue _catalogue;
    private readonly DiagnosticList _diagnostics;
    private readonly RuleNames _names;

    public ExclusionChecker(TelemetryCatalogue catalogue, DiagnosticList diagnostics, RuleNames names)
    {
        _catalogue = catalogue;
        _diagnostics = diagnostics;
        _names = names;
    }

    internal CompiledExclusion? Check(ExclusionSyntax exclusion)
    {
        var failed = false;
        if (!_catalogue.HasTarget(exclusion.Target.Text))
        {
            _diagnostics.Error(DiagnosticCode.UnknownCommand, exclusion.Target.Location, $"unknown command target '{exclusion.Target.Text}'");
            failed = true;
        }

        foreach (var rule in exclusion.Rules)
        {
            failed |= !_names.Known(rule);
        }

        return failed ? null : new CompiledExclusion(new ComponentId(exclusion.Target.Text), exclusion.Rules.Select(r => r.Text).Distinct(StringComparer.Ordinal).ToArray());
    }

    /// <summary>
    /// Rules that command one target at one priority conflict unless an 'exclusive' block on that target holds both.
    /// Each such group is reported once, naming its rules, in time near-linear in the rules and block members (a
    /// thousand rules on one actuator are one error, not half a million).
    /// </summary>
    internal void CheckConflicts(RuleSetSyntax tree)
    {
        var commanders = new List<(RuleSyntax Rule, string Target, SourceLocation At)>();
        foreach (var rule in tree.Rules)
        {
            foreach (var send in AllSends(rule).GroupBy(s => s.Target.Text, StringComparer.Ordinal).Select(g => g.First()))
            {
                commanders.Add((rule, send.Target.Text, send.Target.Location));
            }
        }

        var blocksByTarget = tree.Exclusions
            .GroupBy(e => e.Target.Text, StringComparer.Ordinal)
            .ToDictionary(g => g.Key, g => g.Select(e => e.Rules.Select(r => r.Text).ToHashSet(StringComparer.Ordinal)).ToArray(), StringComparer.Ordinal);
        foreach (var group in commanders.GroupBy(c => (c.Target, c.Rule.Priority)))
        {
            // One entry per rule name: a rule that commands the target twice does not conflict with itself.
            var members = group.GroupBy(c => c.Rule.Name.Text, StringComparer.Ordinal).Select(g => g.First()).ToArray();
            if (members.Length < 2) continue;
            var blocks = blocksByTarget.GetValueOrDefault(group.Key.Target) ?? [];
            var conflicting = ConflictingMembers(members.Select(m => m.Rule.Name.Text).ToArray(), blocks);
            if (conflicting.Count == 0) continue;
            var listed = members.Where(m => conflicting.Contains(m.Rule.Name.Text)).ToArray();
            var names = string.Join(", ", listed.Take(8).Select(m => $"'{m.Rule.Name.Text}' (line {m.At.Line})"));
            var more = listed.Length > 8 ? $" and {listed.Length - 8} more" : "";
            var example = $"exclusive {group.Key.Target} ({string.Join(", ", listed.Take(3).Select(m => m.Rule.Name.Text))}{(listed.Length > 3 ? ", ..." : "")})";
            _diagnostics.Error(DiagnosticCode.ActuatorConflict, listed[1].At,
                $"{listed.Length} rules command '{group.Key.Target}' at priority {group.Key.Priority} and may act at once: {names}{more}; give them different priorities or declare '{example}'");
        }
    }

    /// <summary>The members not excluded from every other member by some block that holds both.</summary>
    private static HashSet<string> ConflictingMembers(string[] members, HashSet<string>[] blocks)
    {
        var conflicting = new HashSet<string>(StringComparer.Ordinal);
        var memberSet = members.ToHashSet(StringComparer.Ordinal);
        // The usual cases in linear time: no block at all, or one block that holds the whole group.
        if (blocks.Any(b => memberSet.IsSubsetOf(b))) return conflicting;
        var blocksOf = new Dictionary<string, List<HashSet<string>>>(StringComparer.Ordinal);
        foreach (var block in blocks)
        {
            foreach (var name in block.Where(memberSet.Contains))
            {
                if (!blocksOf.TryGetValue(name, out var list)) blocksOf[name] = list = [];
                list.Add(block);
            }
        }

        foreach (var name in members)
        {
            if (!blocksOf.TryGetValue(name, out var own))
            {
                conflicting.Add(name);
                continue;
            }

            // Partners this rule is excluded from; stop as soon as they cover the group.
            var partners = new HashSet<string>(StringComparer.Ordinal);
            foreach (var block in own)
            {
                foreach (var other in block)
                {
                    if (memberSet.Contains(other)) partners.Add(other);
                }

                if (partners.Count == members.Length) break;
            }

            if (partners.Count < members.Length) conflicting.Add(name);
        }

        return conflicting;
    }

    internal void WarnAboutUnused(RuleSetSyntax tree)
    {
        var byName = new Dictionary<string, HashSet<string>>(StringComparer.Ordinal);
        foreach (var rule in tree.Rules)
        {
            if (byName.ContainsKey(rule.Name.Text)) continue;
            byName[rule.Name.Text] = AllSends(rule).Select(s => s.Target.Text).ToHashSet(StringComparer.Ordinal);
        }

        foreach (var exclusion in tree.Exclusions)
        {
            foreach (var name in exclusion.Rules)
            {
                if (byName.TryGetValue(name.Text, out var targets) && !targets.Contains(exclusion.Target.Text))
                {
                    _diagnostics.Warning(DiagnosticCode.UnusedExclusion, name.Location, $"rule '{name.Text}' never commands '{exclusion.Target.Text}'");
                }
            }
        }
    }

    private static IEnumerable<SendSyntax> AllSends(RuleSyntax rule) =>
        rule.Actions.Concat(rule.Escalations.SelectMany(e => e.Actions)).OfType<SendSyntax>();
}
