using DescentOps.Primitives.Time;

namespace DescentOps.Rules.Evaluation;

/// <summary>
/// One evaluation of a rule: when, what caused it (the points sampled at this instant, none for a scheduled
/// wake-up), and the history to read.
/// </summary>
internal sealed record EvaluationContext(SimTime Now, IReadOnlyList<string> TriggerPoints, TelemetryHistory History);
