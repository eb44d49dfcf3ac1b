using DescentOps.Rules.Text;

namespace DescentOps.Rules.Syntax;

/// <summary>"start PROCEDURE".</summary>
public sealed record StartSyntax(NameSyntax Procedure, SourceLocation Location) : ActionSyntax(Location);
