using DescentOps.Primitives.Time;
using DescentOps.Rules.Compiled;

namespace DescentOps.Mission.Procedures;

/// <summary>A step that asks for confirmation waits for a person: its command (<see cref="Send"/>) goes only once confirmed.</summary>
public sealed record StepAwaitsAnswer(SimTime Time, string Procedure, string Step, CommandAction? Send) : ProcedureOutput(Time, Procedure);
