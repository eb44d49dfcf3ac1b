using DescentOps.Rules.Text;

namespace DescentOps.Rules.Syntax;

/// <summary>"rate of POINT over WINDOW above 0.2 m/h": the change of a point per unit time across a window.</summary>
public sealed record RateCheckSyntax(NameSyntax Point, QuantitySyntax Window, ThresholdSyntax Threshold, SourceLocation Location) : ConditionSyntax(Location);
