using DescentOps.Primitives.Time;

namespace DescentOps.Mission.Procedures;

/// <summary>A start while the procedure runs; the running one goes on.</summary>
public sealed record ProcedureStartIgnored(SimTime Time, string Procedure, string By, string RunningStep) : ProcedureOutput(Time, Procedure);
