using DescentOps.Primitives.Time;

namespace DescentOps.Mission.Procedures;

/// <summary>The procedure ended: done, or aborted for <see cref="Reason"/>.</summary>
public sealed record ProcedureFinished(SimTime Time, string Procedure, ProcedureOutcome Outcome, string Reason) : ProcedureOutput(Time, Procedure);
