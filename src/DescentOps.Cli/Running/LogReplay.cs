using DescentOps.Journal;
using DescentOps.Journal.Comparison;
using DescentOps.Mission.Running;

namespace DescentOps.Cli.Running;

/// <summary>
/// Re-runs a logged run from its manifest and compares the new journal with the file line by line as it is written,
/// up to the log's intact lines. The one replay procedure: the command and the tests both call it.
/// </summary>
public static class LogReplay
{
    public static async Task<(JournalDivergence? Divergence, long LinesMatched)> CompareAsync(LoggedRun logged, KernelChoice kernel = KernelChoice.Actors)
    {
        using var comparison = new LineComparingStream(File.OpenRead(logged.Path), logged.IntactLines);
        using (var writer = JournalWriter.Create(comparison, logged.Manifest))
        {
            // A rehearsal's console inputs come back from the log itself.
            var additions = Rehearsal.RehearsalLog.ForReplay(logged.Manifest, logged.Scenario, logged.Path);
            await JournaledRun.RunAsync(logged.Scenario, logged.Manifest, writer, kernel, additions: additions).ConfigureAwait(false);
        }

        comparison.Finish();
        return (comparison.Divergence, comparison.LinesMatched);
    }
}
