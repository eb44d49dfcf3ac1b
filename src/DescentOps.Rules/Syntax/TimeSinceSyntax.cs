using DescentOps.Rules.Text;

namespace DescentOps.Rules.Syntax;

/// <summary>"time since (A) above 2 h": the time since A last began to hold, compared with a duration.</summary>
public sealed record TimeSinceSyntax(ConditionSyntax Event, Comparison Comparison, QuantitySyntax Duration, SourceLocation ComparisonLocation, SourceLocation Location) : ConditionSyntax(Location);
