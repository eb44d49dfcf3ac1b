using System.Globalization;
using DescentOps.Records;
using DescentOps.Engine.Randomness;
using DescentOps.Engine.Running;
using DescentOps.Journal;

namespace DescentOps.Benchmarks.Phold;

/// <summary>
/// A real journal file for one benchmark run, written the way the command line writes a mission log
/// (manifest, events, summary, rename on completion) and deleted afterwards; it remembers the size of the
/// last one so the table can say how many bytes a journaled event cost.
/// </summary>
public sealed class FileJournal : IDisposable
{
    private readonly DirectoryInfo _directory = Directory.CreateTempSubdirectory("descentops-phold-");

    public long LastBytes { get; private set; }

    public long LastRecords { get; private set; }

    public async Task<RunResult> WriteAsync(PholdOptions options, DelayLaw law, Func<IJournalSink, Task<RunResult>> run)
    {
        var path = Path.Combine(_directory.FullName, "phold.jsonl");
        var manifest = new RunManifest(
            "DescentOps.Benchmarks",
            "phold",
            string.Create(CultureInfo.InvariantCulture, $"phold lps={options.Processes} tokens={options.Tokens} delay={law} mean_ms={options.MeanDelayMs}"),
            options.Seed,
            options.Until.SecondsSinceEpoch,
            RandomStream.AlgorithmName);
        RunResult result;
        using (var writer = JournalWriter.Create(path, manifest))
        {
            result = await run(writer);
            writer.Complete(new RunSummary(result.Outcome.Kind.ToString(), result.Outcome.Reason, result.Outcome.Time.SecondsSinceEpoch, []));
            LastRecords = writer.EventCount;
        }

        LastBytes = new FileInfo(path).Length;
        File.Delete(path);
        return result;
    }

    public void Dispose() => _directory.Delete(recursive: true);
}
