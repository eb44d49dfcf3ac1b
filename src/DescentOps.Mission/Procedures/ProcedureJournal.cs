using DescentOps.Engine.Components;
using DescentOps.Mission.Messages;
using DescentOps.Records;
using DescentOps.Records.Kinds;

namespace DescentOps.Mission.Procedures;

/// <summary>
/// Writes what the procedures did into the log, one record per output, and returns the telecommands their steps send,
/// each with its origin ("procedure NAME, step STEP").
/// </summary>
public static class ProcedureJournal
{
    public static IReadOnlyList<Telecommand> Write(IReadOnlyList<ProcedureOutput> outputs, ComponentContext context)
    {
        var commands = new List<Telecommand>();
        foreach (var output in outputs)
        {
            switch (output)
            {
                case ProcedureStarted started:
                    context.Record(ProcedureRecords.Started, Severity.Notice,
                        RecordField.Of("procedure", started.Procedure),
                        RecordField.Of("by", started.By));
                    break;
                case ProcedureStartIgnored ignored:
                    context.Record(ProcedureRecords.StartIgnored, Severity.Info,
                        RecordField.Of("procedure", ignored.Procedure),
                        RecordField.Of("by", ignored.By),
                        RecordField.Of("running_step", ignored.RunningStep));
                    break;
                case StepStarted step:
                    RecordField[] fields =
                    [
                        RecordField.Of("procedure", step.Procedure),
                        RecordField.Of("step", step.Step),
                        RecordField.Of("command", step.Send?.ToString() ?? ""),
                        .. step.Deadline is { } late ? [RecordField.Of("late_at_s", late.SecondsSinceEpoch)] : Array.Empty<RecordField>(),
                    ];
                    context.Record(ProcedureRecords.StepStarted, Severity.Info, fields);
                    if (step.Send is { } send) commands.Add(new Telecommand(send, $"procedure {step.Procedure}, step {step.Step}", "ground", context.Now));
                    break;
                case StepAwaitsAnswer awaits:
                    context.Record(ProcedureRecords.StepAwaitsAnswer, Severity.Notice,
                        RecordField.Of("procedure", awaits.Procedure),
                        RecordField.Of("step", awaits.Step),
                        RecordField.Of("command", awaits.Send?.ToString() ?? ""));
                    break;
                case StepAnswered answered:
                    context.Record(answered.Confirmed ? ProcedureRecords.StepConfirmed : ProcedureRecords.StepSkipped, Severity.Notice,
                        RecordField.Of("procedure", answered.Procedure),
                        RecordField.Of("step", answered.Step),
                        RecordField.Of("by", answered.By),
                        RecordField.Of("input", answered.Number));
                    break;
                case ProcedureAnswerIgnored ignored:
                    context.Record(ProcedureRecords.AnswerIgnored, Severity.Warning,
                        RecordField.Of("procedure", ignored.Procedure),
                        RecordField.Of("step", ignored.Step),
                        RecordField.Of("by", ignored.By),
                        RecordField.Of("input", ignored.Number),
                        RecordField.Of("reason", ignored.Reason));
                    break;
                case StepEnded { Verdict: StepVerdict.Skipped }:
                    // The skip is the answer's record (who and when); the step has no verdict of its own to log.
                    break;
                case StepEnded ended:
                    context.Record(KindOf(ended.Verdict), ended.Verdict == StepVerdict.Passed ? Severity.Info : Severity.Warning,
                        RecordField.Of("procedure", ended.Procedure),
                        RecordField.Of("step", ended.Step),
                        RecordField.Of("took_s", ended.Took.TotalSeconds),
                        RecordField.Of("evidence", ended.Evidence.Length == 0 ? (ended.Verdict == StepVerdict.Late ? "no frame received" : "") : ended.Evidence),
                        RecordField.Of("next", ended.Next));
                    break;
                case ProcedureFinished finished:
                    context.Record(ProcedureRecords.Finished, finished.Outcome == ProcedureOutcome.Done ? Severity.Notice : Severity.Warning,
                        RecordField.Of("procedure", finished.Procedure),
                        RecordField.Of("outcome", finished.Outcome == ProcedureOutcome.Done ? "done" : "aborted"),
                        RecordField.Of("reason", finished.Reason));
                    break;
            }
        }

        return commands;
    }

    public static string KindOf(StepVerdict verdict) => verdict switch
    {
        StepVerdict.Passed => ProcedureRecords.StepPassed,
        StepVerdict.Failed => ProcedureRecords.StepFailed,
        StepVerdict.Late => ProcedureRecords.StepLate,
        _ => throw new ArgumentOutOfRangeException(nameof(verdict), verdict, "a verdict without a record kind"),
    };
}
