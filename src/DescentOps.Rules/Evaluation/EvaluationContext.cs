using DescentOps.Primitives.Time;

namespace DescentOps.Rules.Evaluation;

/// <summary>
/// One evaluation of a rule: when, what caused it (a sample of TriggerPoint, or a scheduled wake-up when null),
/// and the history to read.
/// </summary>
internal sealed record EvaluationContext(SimTime Now, string? TriggerPoint, TelemetryHistory History);
