using DescentOps.Rules.Text;

namespace DescentOps.Rules.Syntax;

/// <summary>"disable RULE".</summary>
public sealed record DisableSyntax(NameSyntax Rule, SourceLocation Location) : ActionSyntax(Location);
