using DescentOps.Rules.Text;

namespace DescentOps.Rules.Syntax;

/// <summary>"wait 10 min": the rest of the sequence goes out that much later.</summary>
public sealed record WaitSyntax(QuantitySyntax Duration, SourceLocation Location) : ActionSyntax(Location);
