using DescentOps.Rules.Text;

namespace DescentOps.Rules.Syntax;

/// <summary>One step of an action sequence.</summary>
public abstract record ActionSyntax(SourceLocation Location);
