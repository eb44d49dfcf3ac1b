using DescentOps.Rules.Text;

namespace DescentOps.Rules.Syntax;

/// <summary>A name as written: a rule, a telemetry point, a command target or name, an argument, a discrete value.</summary>
public sealed record NameSyntax(string Text, SourceLocation Location);
