using DescentOps.Primitives.Time;

namespace DescentOps.Mission.Procedures;

/// <summary>An answer that found no step waiting for it: the procedure is not running, runs another step, or that step does not wait.</summary>
public sealed record ProcedureAnswerIgnored(SimTime Time, string Procedure, string Step, string By, long Number, string Reason) : ProcedureOutput(Time, Procedure);
