using DescentOps.Rules.Text;

namespace DescentOps.Rules.Syntax;

/// <summary>The tree that could be read and the located syntax errors; a rule with an error is left out of the tree.</summary>
public sealed record ParseResult(RuleSetSyntax RuleSet, IReadOnlyList<RuleDiagnostic> Errors)
{
    public bool Succeeded => Errors.Count == 0;
}
