using DescentOps.Primitives.Time;

namespace DescentOps.Engine.Running;

/// <summary>The end of a run: its kind, a sentence for people, and the simulated instant it happened.</summary>
public sealed record RunOutcome(RunOutcomeKind Kind, string Reason, SimTime Time);
