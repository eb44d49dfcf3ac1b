using DescentOps.Primitives.Time;

namespace DescentOps.Mission.Procedures;

/// <summary>
/// A step was confirmed or skipped by <see cref="By"/> (a person at the console, with the input's <see cref="Number"/>;
/// or the team, number 0, in a run without a console).
/// </summary>
public sealed record StepAnswered(SimTime Time, string Procedure, string Step, bool Confirmed, string By, long Number) : ProcedureOutput(Time, Procedure);
