using DescentOps.Rules.Text;

namespace DescentOps.Rules.Syntax;

/// <summary>"A and B and ...".</summary>
public sealed record AllOfSyntax(IReadOnlyList<ConditionSyntax> Operands, SourceLocation Location) : ConditionSyntax(Location);
