using DescentOps.Mission.Procedures;
using DescentOps.Records;
using DescentOps.Records.Kinds;

namespace DescentOps.Mission.Running;

/// <summary>
/// Which rules acted and which procedure branches were taken, read from a run's records as they are written or from a
/// log read back: the one reading behind <c>check SCENARIO --coverage LOG</c> and a campaign's coverage table.
/// </summary>
public sealed class CoverageTally
{
    private readonly HashSet<string> _acted = new(StringComparer.Ordinal);
    private readonly List<(string Procedure, string Step, StepVerdict Verdict)> _verdicts = [];

    public void Observe(string kind, IReadOnlyList<RecordField> fields)
    {
        StepVerdict? verdict = kind switch
        {
            ProcedureRecords.StepPassed => StepVerdict.Passed,
            ProcedureRecords.StepFailed => StepVerdict.Failed,
            ProcedureRecords.StepLate => StepVerdict.Late,
            _ => null,
        };
        if (verdict is { } v) _verdicts.Add((Text(fields, "procedure"), Text(fields, "step"), v));
        else if (kind is RuleRecords.Fired or RuleRecords.Escalated or RuleRecords.Continued) _acted.Add(Text(fields, "rule"));
    }

    /// <summary>Each rule of the set (in its order, once) with whether it acted.</summary>
    public IReadOnlyList<RuleCoverage> Rules(IEnumerable<string> ruleNames) => [.. ruleNames.Distinct().Select(r => new RuleCoverage(r, _acted.Contains(r)))];

    /// <summary>Every branch of the procedures with how often it was taken (<see cref="ProcedureCoverage.Of"/>).</summary>
    public IReadOnlyList<BranchCoverage> Branches(IReadOnlyList<CompiledProcedure> procedures) =>
        [.. ProcedureCoverage.Of(procedures, _verdicts).Select(b => new BranchCoverage(b.Procedure, b.Step, ProcedureRunner.Word(b.Verdict), b.Taken))];

    /// <summary>The tally's branches in the shape <see cref="ProcedureCoverage.Lines"/> prints.</summary>
    public IReadOnlyList<(string Procedure, string Step, StepVerdict Verdict, int Taken)> BranchCounts(IReadOnlyList<CompiledProcedure> procedures) =>
        ProcedureCoverage.Of(procedures, _verdicts);

    private static string Text(IReadOnlyList<RecordField> fields, string name) => fields.Where(f => f.Name == name).Select(f => f.Text).FirstOrDefault() ?? "";
}
