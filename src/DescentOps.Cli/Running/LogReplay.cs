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
    /// <param name="logged">The log to re-run.</param>
    /// <param name="kernel">The kernel to re-run it on.</param>
    /// <param name="progress">Called at the kernel's progress points with the share of the log's lines matched so far;
    /// it may throw <see cref="OperationCanceledException"/> to stop the replay.</param>
    public static async Task<(JournalDivergence? Divergence, long LinesMatched)> CompareAsync(LoggedRun logged, KernelChoice kernel = KernelChoice.Actors, Action<double>? progress = null)
    {
        using var comparison = new LineComparingStream(File.OpenRead(logged.Path), logged.IntactLines);
        using (var writer = JournalWriter.Create(comparison, logged.Manifest))
        {
            // A rehearsal's console inputs come back from the log itself.
            var additions = Rehearsal.RehearsalLog.ForReplay(logged.Manifest, logged.Scenario, logged.Path);
            var total = Math.Max(1, logged.IntactLines);
            await JournaledRun.RunAsync(logged.Scenario, logged.Manifest, writer, kernel,
                progress is null ? null : _ => progress(comparison.LinesMatched / (double)total), additions: additions).ConfigureAwait(false);
        }

        comparison.Finish();
        return (comparison.Divergence, comparison.LinesMatched);
    }
}
