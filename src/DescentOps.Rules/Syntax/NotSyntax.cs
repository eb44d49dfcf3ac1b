using DescentOps.Rules.Text;

namespace DescentOps.Rules.Syntax;

/// <summary>"not A".</summary>
public sealed record NotSyntax(ConditionSyntax Operand, SourceLocation Location) : ConditionSyntax(Location);
