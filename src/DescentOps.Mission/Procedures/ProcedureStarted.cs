using DescentOps.Primitives.Time;

namespace DescentOps.Mission.Procedures;

/// <summary>The procedure starts now, because of <see cref="By"/> (a rule's name, or the scenario field of its time).</summary>
public sealed record ProcedureStarted(SimTime Time, string Procedure, string By) : ProcedureOutput(Time, Procedure);
