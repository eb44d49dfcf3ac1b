using DescentOps.Records;
using DescentOps.Engine.Running;
using DescentOps.Journal;
using DescentOps.Mission.Running;
using DescentOps.Scenarios.Model;

namespace DescentOps.Cli.Running;

/// <summary>
/// A mission run written into a journal: the one way runs, replays and tests produce logs, so they cannot
/// drift apart. A run that throws abandons its journal instead of leaving half a log; a run stopped by the user
/// (<see cref="OperationCanceledException"/> from a progress point) keeps what it wrote under the temporary name.
/// </summary>
public static class JournaledRun
{
    public static async Task<MissionSummary> RunAsync(
        Scenario scenario,
        RunManifest manifest,
        JournalWriter writer,
        KernelChoice kernel = KernelChoice.Actors,
        Action<KernelProgress>? progress = null,
        IJournalSink? observer = null,
        RunAdditions? additions = null)
    {
        try
        {
            IJournalSink sink = observer is null ? writer : new TeeSink(writer, observer);
            var summary = await MissionRunner.RunAsync(scenario, manifest.Seed, manifest.UntilSeconds, sink, kernel, progress, additions).ConfigureAwait(false);
            try
            {
                writer.Complete(new RunSummary(summary.Outcome.Kind.ToString(), summary.Outcome.Reason, summary.FinalTimeS, summary.ToFields()));
            }
            catch (IOException exception) when (writer is { PartialPath: { } partial, FinalPath: { } final } && File.Exists(partial) && File.Exists(final))
            {
                throw new FinalNameTakenException(summary, partial, final, exception);
            }

            return summary;
        }
        catch (OperationCanceledException)
        {
            throw;
        }
        catch
        {
            writer.Abandon();
            throw;
        }
    }
}
