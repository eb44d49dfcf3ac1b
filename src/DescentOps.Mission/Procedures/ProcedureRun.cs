using DescentOps.Primitives.Time;

namespace DescentOps.Mission.Procedures;

/// <summary>
/// Where a running procedure stands: its step, when that step started and when it is late. <see cref="Outcome"/> is
/// null while it runs. <see cref="EnteredThisInstant"/> counts the steps entered at <see cref="StepStartedAt"/>, so that
/// steps that wait for nothing cannot go round in a loop within one instant.
/// </summary>
public sealed record ProcedureRun(string Procedure, int Step, SimTime StepStartedAt, SimTime? Deadline, ProcedureOutcome? Outcome, int EnteredThisInstant)
{
    public bool IsRunning => Outcome is null;

    /// <summary>Whether people at a console answer the steps that ask for confirmation (else the team confirms at once).</summary>
    public bool PeopleAnswer { get; init; }

    /// <summary>Whether the step waits for a person to confirm or skip it (its command not yet sent).</summary>
    public bool AwaitingAnswer { get; init; }
}
