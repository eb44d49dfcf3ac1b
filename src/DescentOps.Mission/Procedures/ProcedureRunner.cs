using DescentOps.Primitives.Time;

namespace DescentOps.Mission.Procedures;

/// <summary>
/// The procedure as a pure state machine: each transition takes the run's state and an event (started, the step's
/// wait ended with its check's verdict, its time ran out) and returns the next state with what to record and send.
/// Entering a step that watches nothing passes it at once and goes on, within the same instant; a run that enters
/// more steps in one instant than the procedure has goes round without waiting and is aborted.
/// Conditions are judged elsewhere (<see cref="ProcedureWatch"/>); nothing here reads telemetry or a clock.
/// </summary>
public static class ProcedureRunner
{
    public const string LoopReason = "its steps go round without waiting for anything";

    /// <summary>The name under which the team confirms steps in a run without a console.</summary>
    public const string Team = "team (no console)";

    /// <summary>
    /// Starts <paramref name="procedure"/> at its first step. With <paramref name="peopleAnswer"/> (a console), steps that
    /// ask for confirmation wait for a person; without, the team confirms them at once.
    /// </summary>
    public static ProcedureTransition Start(CompiledProcedure procedure, string by, SimTime now, bool peopleAnswer = false)
    {
        var outputs = new List<ProcedureOutput> { new ProcedureStarted(now, procedure.Name, by) };
        var run = new ProcedureRun(procedure.Name, 0, now, null, null, 0) { PeopleAnswer = peopleAnswer };
        return new(Enter(procedure, run, 0, now, outputs), outputs);
    }

    /// <summary>
    /// A person confirmed the step that waits for an answer (its command goes now and its wait begins, late at now plus
    /// 'within'), or skipped it (its command never goes; the procedure goes where a pass goes).
    /// </summary>
    public static ProcedureTransition Answer(CompiledProcedure procedure, ProcedureRun run, bool confirmed, string by, long number, SimTime now)
    {
        if (!run.IsRunning || !run.AwaitingAnswer) throw new InvalidOperationException($"procedure '{run.Procedure}' step {run.Step} waits for no answer");
        var step = procedure.Steps[run.Step];
        var outputs = new List<ProcedureOutput> { new StepAnswered(now, procedure.Name, step.Name, confirmed, by, number) };
        run = run with { AwaitingAnswer = false };
        if (confirmed) return new(Begin(procedure, run, run.Step, now, outputs), outputs);
        outputs.Add(new StepEnded(now, procedure.Name, step.Name, StepVerdict.Skipped, "", now - run.StepStartedAt, NameOf(procedure, step.OnPass)));
        return new(Enter(procedure, run, step.OnPass, now, outputs), outputs);
    }

    /// <summary>The step's wait ended on a frame: it passes when its check held (or it has none), and fails when not.</summary>
    public static ProcedureTransition WaitEnded(CompiledProcedure procedure, ProcedureRun run, bool checkHeld, string evidence, SimTime now) =>
        End(procedure, run, checkHeld ? StepVerdict.Passed : StepVerdict.Failed, evidence, now);

    /// <summary>The step's time ran out with its wait not over: late, which goes where a failure goes.</summary>
    public static ProcedureTransition TimedOut(CompiledProcedure procedure, ProcedureRun run, string evidence, SimTime now)
    {
        if (run.Deadline is not { } deadline || now < deadline)
        {
            throw new InvalidOperationException($"procedure '{run.Procedure}' step {run.Step} is not late at {now} (deadline {run.Deadline?.ToString() ?? "none"})");
        }

        return End(procedure, run, StepVerdict.Late, evidence, now);
    }

    private static ProcedureTransition End(CompiledProcedure procedure, ProcedureRun run, StepVerdict verdict, string evidence, SimTime now)
    {
        if (!run.IsRunning) throw new InvalidOperationException($"procedure '{run.Procedure}' has finished");
        var step = procedure.Steps[run.Step];
        var next = verdict == StepVerdict.Passed ? step.OnPass : step.OnFail;
        var outputs = new List<ProcedureOutput> { new StepEnded(now, procedure.Name, step.Name, verdict, evidence, now - run.StepStartedAt, NameOf(procedure, next)) };
        return new(Enter(procedure, run, next, now, outputs), outputs);
    }

    /// <summary>Goes to <paramref name="index"/> (a step, or done / abort), passing steps that watch nothing.</summary>
    private static ProcedureRun Enter(CompiledProcedure procedure, ProcedureRun run, int index, SimTime now, List<ProcedureOutput> outputs)
    {
        var entered = run.StepStartedAt == now ? run.EnteredThisInstant : 0;
        while (true)
        {
            if (index is CompiledStep.Done or CompiledStep.Abort)
            {
                var outcome = index == CompiledStep.Done ? ProcedureOutcome.Done : ProcedureOutcome.Aborted;
                var reason = outputs.LastOrDefault() is StepEnded ended ? $"step '{ended.Step}' {Word(ended.Verdict)}, goto {NameOf(procedure, index)}" : "";
                outputs.Add(new ProcedureFinished(now, procedure.Name, outcome, reason));
                return run with { Outcome = outcome, Deadline = null };
            }

            if (++entered > procedure.Steps.Count)
            {
                outputs.Add(new ProcedureFinished(now, procedure.Name, ProcedureOutcome.Aborted, LoopReason));
                return run with { Outcome = ProcedureOutcome.Aborted, Deadline = null };
            }

            var step = procedure.Steps[index];
            run = run with { Step = index, StepStartedAt = now, Deadline = null, EnteredThisInstant = entered };
            if (step.Confirm && run.PeopleAnswer)
            {
                outputs.Add(new StepAwaitsAnswer(now, procedure.Name, step.Name, step.Send));
                return run with { AwaitingAnswer = true };
            }

            if (step.Confirm) outputs.Add(new StepAnswered(now, procedure.Name, step.Name, true, Team, 0));
            if (step.Watches) return Begin(procedure, run, index, now, outputs);
            outputs.Add(new StepStarted(now, procedure.Name, step.Name, step.Send, null));
            outputs.Add(new StepEnded(now, procedure.Name, step.Name, StepVerdict.Passed, "", SimDuration.Zero, NameOf(procedure, step.OnPass)));
            index = step.OnPass;
        }
    }

    /// <summary>The step's command goes and its wait begins; a step that watches nothing passes at once and goes on.</summary>
    private static ProcedureRun Begin(CompiledProcedure procedure, ProcedureRun run, int index, SimTime now, List<ProcedureOutput> outputs)
    {
        var step = procedure.Steps[index];
        var deadline = step.Watches && step.Within is { } within ? now + within : (SimTime?)null;
        outputs.Add(new StepStarted(now, procedure.Name, step.Name, step.Send, deadline));
        if (step.Watches) return run with { Deadline = deadline };
        outputs.Add(new StepEnded(now, procedure.Name, step.Name, StepVerdict.Passed, "", now - run.StepStartedAt, NameOf(procedure, step.OnPass)));
        return Enter(procedure, run, step.OnPass, now, outputs);
    }

    /// <summary>The name a goto target is written with.</summary>
    public static string NameOf(CompiledProcedure procedure, int index) => index switch
    {
        CompiledStep.Done => Scenarios.Format.ProceduresFormat.Done,
        CompiledStep.Abort => Scenarios.Format.ProceduresFormat.Abort,
        _ => procedure.Steps[index].Name,
    };

    /// <summary>The verdict as the log words it.</summary>
    public static string Word(StepVerdict verdict) => verdict switch
    {
        StepVerdict.Passed => "passed",
        StepVerdict.Failed => "failed",
        StepVerdict.Late => "late",
        StepVerdict.Skipped => "skipped",
        _ => throw new ArgumentOutOfRangeException(nameof(verdict), verdict, "a verdict without a word"),
    };
}
