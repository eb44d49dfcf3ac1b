using DescentOps.Rules.Text;

namespace DescentOps.Rules.Syntax;

/// <summary>"A for 10 min": A must hold without a break for the duration.</summary>
public sealed record HoldsForDurationSyntax(ConditionSyntax Operand, QuantitySyntax Duration, SourceLocation Location) : ConditionSyntax(Location);
