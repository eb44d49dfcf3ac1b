namespace DescentOps.Records.Kinds;

/// <summary>Record kinds of the journal written by one source. The ground team's operating procedures, step by step.</summary>
public static class ProcedureRecords
{
    public const string Started = "procedure.started";

    /// <summary>A start asked for while the procedure was already running: the running one goes on.</summary>
    public const string StartIgnored = "procedure.start_ignored";

    public const string StepStarted = "procedure.step_started";
    public const string StepPassed = "procedure.step_passed";
    public const string StepFailed = "procedure.step_failed";

    /// <summary>A step whose wait ran past its time ('within') without the condition holding.</summary>
    public const string StepLate = "procedure.step_late";

    public const string Finished = "procedure.finished";

    /// <summary>A step that asks for confirmation waits for a person at the console (its command not yet sent).</summary>
    public const string StepAwaitsAnswer = "procedure.step_awaits_answer";

    /// <summary>Who confirmed a step, and by which console input; its command goes now.</summary>
    public const string StepConfirmed = "procedure.step_confirmed";

    /// <summary>Who skipped a step, and by which console input; its command never goes.</summary>
    public const string StepSkipped = "procedure.step_skipped";

    /// <summary>An answer for a step that was not waiting for one (it had ended, or another step runs).</summary>
    public const string AnswerIgnored = "procedure.answer_ignored";
}
