using DescentOps.Rules.Text;

namespace DescentOps.Rules.Syntax;

/// <summary>"escalate after 2 h { ... }": runs if the condition has not cleared that long after the firing.</summary>
public sealed record EscalationSyntax(QuantitySyntax After, IReadOnlyList<ActionSyntax> Actions, SourceLocation Location);
