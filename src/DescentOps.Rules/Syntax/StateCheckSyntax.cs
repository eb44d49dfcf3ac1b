using DescentOps.Rules.Text;

namespace DescentOps.Rules.Syntax;

/// <summary>"POINT is VALUE" or "POINT is not VALUE": the expected state of a discrete point.</summary>
public sealed record StateCheckSyntax(NameSyntax Point, NameSyntax Value, bool Negated, SourceLocation Location) : ConditionSyntax(Location);
