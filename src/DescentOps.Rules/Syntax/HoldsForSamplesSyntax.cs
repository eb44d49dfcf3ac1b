using DescentOps.Rules.Text;

namespace DescentOps.Rules.Syntax;

/// <summary>"A for 3 samples": A must hold on that many consecutive samples of its own points.</summary>
public sealed record HoldsForSamplesSyntax(ConditionSyntax Operand, int Count, SourceLocation CountLocation, SourceLocation Location) : ConditionSyntax(Location);
