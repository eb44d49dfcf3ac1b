using DescentOps.Rules.Syntax;

namespace DescentOps.Rules.Compiled;

/// <summary>A rule set with no checker errors, ready for the evaluator. Rules keep their declaration order.</summary>
public sealed record CompiledRuleSet(AutonomyLevel? Autonomy, IReadOnlyList<CompiledRule> Rules, IReadOnlyList<CompiledExclusion> Exclusions)
{
    public CompiledRule? FindRule(string name) => Rules.FirstOrDefault(r => r.Name == name);
}
