using DescentOps.Rules.Text;

namespace DescentOps.Rules.Syntax;

/// <summary>"above Q", "below Q", "inside Q to Q", "outside Q to Q"; Upper is set only for the two band forms.</summary>
public sealed record ThresholdSyntax(Comparison Kind, QuantitySyntax Lower, QuantitySyntax? Upper, SourceLocation Location);
