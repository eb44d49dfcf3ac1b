using DescentOps.Primitives.Time;
using DescentOps.Rules.Compiled;

namespace DescentOps.Mission.Procedures;

/// <summary>A step starts: its command leaves now; it is late at <see cref="Deadline"/> (null: it waits for nothing).</summary>
public sealed record StepStarted(SimTime Time, string Procedure, string Step, CommandAction? Send, SimTime? Deadline) : ProcedureOutput(Time, Procedure);
