using DescentOps.Rules.Text;

namespace DescentOps.Rules.Syntax;

/// <summary>"name = 2 kW" (Quantity set) or "name = off" (Word set); exactly one of the two is set.</summary>
public sealed record ArgumentSyntax(NameSyntax Name, QuantitySyntax? Quantity, NameSyntax? Word, SourceLocation Location);
