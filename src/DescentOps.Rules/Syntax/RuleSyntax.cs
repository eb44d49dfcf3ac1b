using DescentOps.Rules.Text;

namespace DescentOps.Rules.Syntax;

/// <summary>
/// One rule as written. Items the text left out are null (placement, severity, condition) so the checker can
/// tell "missing" from "defaulted"; priority defaults to 0 and cooldown to none.
/// </summary>
public sealed record RuleSyntax(
    NameSyntax Name,
    Placement? Placement,
    RuleSeverity? Severity,
    int Priority,
    QuantitySyntax? Cooldown,
    bool StartsDisabled,
    ConditionSyntax? Condition,
    IReadOnlyList<ActionSyntax> Actions,
    IReadOnlyList<EscalationSyntax> Escalations,
    SourceLocation Location);
