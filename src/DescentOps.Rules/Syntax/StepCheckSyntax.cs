using DescentOps.Rules.Text;

namespace DescentOps.Rules.Syntax;

/// <summary>"step of POINT above 5 K": the difference between a point's last two samples.</summary>
public sealed record StepCheckSyntax(NameSyntax Point, ThresholdSyntax Threshold, SourceLocation Location) : ConditionSyntax(Location);
