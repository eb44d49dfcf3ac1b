using DescentOps.Rules.Text;

namespace DescentOps.Rules.Syntax;

/// <summary>"send TARGET COMMAND (name = value, ...)": a telecommand to a component.</summary>
public sealed record SendSyntax(NameSyntax Target, NameSyntax Command, IReadOnlyList<ArgumentSyntax> Arguments, SourceLocation Location) : ActionSyntax(Location);
