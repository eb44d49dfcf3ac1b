using DescentOps.Rules.Text;

namespace DescentOps.Rules.Syntax;

/// <summary>"POINT above 420 K": the latest value of a point against a threshold.</summary>
public sealed record LimitCheckSyntax(NameSyntax Point, ThresholdSyntax Threshold, SourceLocation Location) : ConditionSyntax(Location);
