using DescentOps.Rules.Text;

namespace DescentOps.Rules.Syntax;

/// <summary>
/// "fell/probe.depth minus tarn/probe.depth above 20 m": the latest value of one point less the latest value of
/// another, against a threshold in their common unit.
/// </summary>
public sealed record DifferenceCheckSyntax(NameSyntax Left, NameSyntax Right, ThresholdSyntax Threshold, SourceLocation Location) : ConditionSyntax(Location);
