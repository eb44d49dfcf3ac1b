using DescentOps.Journal;
using DescentOps.Mission.Running;

namespace DescentOps.Campaigns;

/// <summary>
/// Runs one campaign run: a pure function of the plan and the spec (same inputs, same record, on any machine), so a
/// local worker and a remote one give the same answer. The run goes through the in-process sequential kernel; its
/// journal is encoded and chained exactly as <c>descentops run</c> writes it, but nothing reaches a disk unless a log is
/// wanted, and only the summary line's chain value is kept.
/// </summary>
public static class RunExecutor
{
    public static RunRecord Execute(CampaignPlan plan, RunSpec spec, string? logPath = null)
    {
        var scenario = plan.ScenarioOf(spec.Variant);
        var manifest = plan.ManifestFor(spec.Variant, spec.Seed);
        var tail = new ChainTailStream();
        using var writer = logPath is null ? JournalWriter.Create(tail, manifest) : JournalWriter.Create(logPath, manifest);
        MissionSummary summary;
        try
        {
            summary = MissionRunner.RunAsync(scenario, spec.Seed, plan.UntilS, writer, KernelChoice.Sequential).GetAwaiter().GetResult();
            writer.Complete(new RunSummary(summary.Outcome.Kind.ToString(), summary.Outcome.Reason, summary.FinalTimeS, summary.ToFields()));
        }
        catch
        {
            writer.Abandon();
            throw;
        }

        var chain = logPath is null ? tail.LastChain() : LastChainOf(logPath);
        return new RunRecord(
            spec.Variant,
            spec.Index,
            spec.Seed,
            summary.Outcome.Kind.ToString(),
            summary.Outcome.Reason,
            summary.Success,
            summary.BreakthroughTimeS,
            summary.FinalTimeS,
            summary.FinalDepthM,
            summary.EnergyUsedJ,
            summary.FramesLost,
            summary.FramesHeldMax,
            summary.TimeStoppedS,
            summary.LongestStopS,
            summary.TimeFrozenS,
            summary.TimeBlindS,
            summary.VehiclesLost,
            summary.ComponentFailures,
            chain,
            summary.Inputs,
            summary.Criteria,
            summary.Faults,
            [.. summary.RuleNames.Distinct().Select(r => (r, summary.RuleFirings.GetValueOrDefault(r)))])
        {
            Landers = summary.Landers,
            RulesActed = summary.RulesActed,
            Branches = summary.Branches,
        };
    }

    /// <summary>The chain value at the end of a journal file's last line.</summary>
    public static string LastChainOf(string path)
    {
        var last = File.ReadLines(path).LastOrDefault() ?? "";
        var at = last.LastIndexOf("\"chain\":\"", StringComparison.Ordinal);
        return at < 0 ? "" : last.Substring(at + 9, 32);
    }
}
