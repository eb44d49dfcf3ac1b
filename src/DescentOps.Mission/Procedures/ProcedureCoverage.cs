namespace DescentOps.Mission.Procedures;

/// <summary>
/// Which branches of each procedure a trace, a run or a branch took. A step's branches are its outcomes: every step can
/// pass; a step that waits can be late; a step with a check can fail. <see cref="Of"/> counts each branch's takings
/// from the step verdicts seen, listing untaken branches with a count of 0.
/// </summary>
public static class ProcedureCoverage
{
    /// <summary>Every branch of <paramref name="procedures"/> with how often it was taken, in procedure and step order.</summary>
    public static IReadOnlyList<(string Procedure, string Step, StepVerdict Verdict, int Taken)> Of(
        IReadOnlyList<CompiledProcedure> procedures, IEnumerable<(string Procedure, string Step, StepVerdict Verdict)> taken)
    {
        var counts = taken.GroupBy(t => t).ToDictionary(g => g.Key, g => g.Count());
        var branches = new List<(string, string, StepVerdict, int)>();
        foreach (var procedure in procedures)
        {
            foreach (var step in procedure.Steps)
            {
                foreach (var verdict in Branches(step))
                {
                    branches.Add((procedure.Name, step.Name, verdict, counts.GetValueOrDefault((procedure.Name, step.Name, verdict))));
                }
            }
        }

        return branches;
    }

    /// <summary>The outcomes a step can have.</summary>
    public static IEnumerable<StepVerdict> Branches(CompiledStep step)
    {
        yield return StepVerdict.Passed;
        if (step.Expect is not null) yield return StepVerdict.Failed;
        if (step.Watches) yield return StepVerdict.Late;
    }

    /// <summary>One line per procedure: "NAME: k of n branches taken; never: step passed, ...".</summary>
    public static IEnumerable<string> Lines(IReadOnlyList<(string Procedure, string Step, StepVerdict Verdict, int Taken)> branches) =>
        branches.GroupBy(b => b.Procedure).Select(g =>
        {
            var never = g.Where(b => b.Taken == 0).Select(b => $"{b.Step} {ProcedureRunner.Word(b.Verdict)}").ToList();
            return $"procedure {g.Key}: {g.Count(b => b.Taken > 0)} of {g.Count()} branches taken" + (never.Count == 0 ? "" : $"; never: {string.Join(", ", never)}");
        });
}
