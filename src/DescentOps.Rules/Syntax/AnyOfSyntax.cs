using DescentOps.Rules.Text;

namespace DescentOps.Rules.Syntax;

/// <summary>"A or B or ...".</summary>
public sealed record AnyOfSyntax(IReadOnlyList<ConditionSyntax> Operands, SourceLocation Location) : ConditionSyntax(Location);
