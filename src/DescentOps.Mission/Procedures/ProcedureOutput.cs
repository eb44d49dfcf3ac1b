using DescentOps.Primitives.Time;

namespace DescentOps.Mission.Procedures;

/// <summary>
/// What a procedure transition produced, in order: a procedure started or refused a second start, a step started (with
/// the command to send and when it is late), a step ended with its verdict and evidence, a procedure finished.
/// </summary>
public abstract record ProcedureOutput(SimTime Time, string Procedure);
