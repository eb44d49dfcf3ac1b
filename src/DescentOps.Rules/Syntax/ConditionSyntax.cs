using DescentOps.Rules.Text;

namespace DescentOps.Rules.Syntax;

/// <summary>A node of a rule's "when" condition.</summary>
public abstract record ConditionSyntax(SourceLocation Location);
