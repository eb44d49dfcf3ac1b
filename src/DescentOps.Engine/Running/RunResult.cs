using DescentOps.Primitives.Time;

namespace DescentOps.Engine.Running;

/// <summary>What a finished run reports to its caller, besides the journal.</summary>
public sealed record RunResult(RunOutcome Outcome, SimTime FinalTime, long EventsDelivered, long Rounds, long RecordsWritten, int ComponentFailures);
