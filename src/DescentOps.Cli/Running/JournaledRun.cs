using DescentOps.Engine.Running;
using DescentOps.Journal;
using DescentOps.Mission.Running;
using DescentOps.Scenarios.Model;

namespace DescentOps.Cli.Running;

/// <summary>
/// A mission run written into a journal: the one way runs, replays and tests produce logs, so they cannot
/// drift apart. A run that throws abandons its journal instead of leaving half a log.
/// </summary>
public static class JournaledRun
{
    public static async Task<MissionSummary> RunAsync(
        Scenario scenario,
        RunManifest manifest,
        JournalWriter writer,
        KernelChoice kernel = KernelChoice.Actors,
        Action<KernelProgress>? progress = null,
        RunAdditions? additions = null)
    {
        try
        {
            var summary = await MissionRunner.RunAsync(scenario, manifest.Seed, manifest.UntilSeconds, writer, kernel, progress, additions).ConfigureAwait(false);
            writer.Complete(new RunSummary(summary.Outcome.Kind.ToString(), summary.Outcome.Reason, summary.FinalTimeS, summary.ToFields()));
            return summary;
        }
        catch
        {
            writer.Abandon();
            throw;
        }
    }
}
