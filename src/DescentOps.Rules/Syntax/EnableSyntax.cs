using DescentOps.Rules.Text;

namespace DescentOps.Rules.Syntax;

/// <summary>"enable RULE".</summary>
public sealed record EnableSyntax(NameSyntax Rule, SourceLocation Location) : ActionSyntax(Location);
