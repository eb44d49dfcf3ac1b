using DescentOps.Primitives.Time;
using DescentOps.Rules.Syntax;
using DescentOps.Rules.Text;

namespace DescentOps.Rules.Compiled;

/// <summary>A rule that passed the checker. Larger priority numbers win an actuator.</summary>
public sealed record CompiledRule(
    string Name,
    Placement Placement,
    RuleSeverity Severity,
    int Priority,
    SimDuration Cooldown,
    bool StartsEnabled,
    CompiledCondition Condition,
    IReadOnlyList<CompiledAction> Actions,
    IReadOnlyList<CompiledEscalation> Escalations,
    SourceLocation Location);
