using DescentOps.Rules.Text;

namespace DescentOps.Rules.Syntax;

/// <summary>"latched (A)": holds from the first instant A held, for as long as the rule stays enabled.</summary>
public sealed record LatchedSyntax(ConditionSyntax Operand, SourceLocation Location) : ConditionSyntax(Location);
