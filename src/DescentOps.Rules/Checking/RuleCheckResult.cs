using DescentOps.Rules.Compiled;
using DescentOps.Rules.Text;

namespace DescentOps.Rules.Checking;

/// <summary>
/// Errors and warnings apart, each sorted by place. RuleSet is set exactly when there are no errors:
/// a rule set with warnings still runs.
/// </summary>
public sealed record RuleCheckResult(IReadOnlyList<RuleDiagnostic> Errors, IReadOnlyList<RuleDiagnostic> Warnings, CompiledRuleSet? RuleSet)
{
    public bool Succeeded => RuleSet is not null;
}
