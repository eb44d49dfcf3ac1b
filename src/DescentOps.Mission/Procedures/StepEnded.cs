using DescentOps.Primitives.Time;

namespace DescentOps.Mission.Procedures;

/// <summary>
/// A step ended. <see cref="Evidence"/> is what the ground saw ("point=value@t s", the sampling time), <see cref="Took"/>
/// the time since the step started, <see cref="Next"/> the step it goes to ("done", "abort" or a step name).
/// </summary>
public sealed record StepEnded(SimTime Time, string Procedure, string Step, StepVerdict Verdict, string Evidence, SimDuration Took, string Next) : ProcedureOutput(Time, Procedure);
