using DescentOps.Cli.Commands;
using DescentOps.Cli.Running;
using DescentOps.Journal;
using DescentOps.Mission.Running;
using DescentOps.Reports.Html;
using DescentOps.Scenarios;

namespace DescentOps.Reports.Tests;

/// <summary>
/// Logs made once for every test: two real runs of the default mission (the scenario's seed and the next one),
/// written exactly as <c>descentops run</c> writes them, plus a truncated and an edited copy of the first.
/// </summary>
public sealed class RunLogs : IAsyncLifetime
{
    private readonly Lazy<string> _defaultReport;

    public RunLogs()
    {
        _defaultReport = new Lazy<string>(() =>
        {
            var path = File("default.html");
            PostMortemReport.Write(RunLog.Load(DefaultLog), path, "DescentOps tests");
            return path;
        });
    }

    public string Directory { get; } = System.IO.Directory.CreateTempSubdirectory("descentops-reports-tests-").FullName;

    public string DefaultLog => File("default.jsonl");

    public string OtherSeedLog => File("other-seed.jsonl");

    /// <summary>The default log cut in the middle of a line about halfway through.</summary>
    public string TruncatedLog => File("truncated.jsonl");

    /// <summary>1-based number of the cut line in <see cref="TruncatedLog"/>.</summary>
    public long TruncatedAtLine { get; private set; }

    /// <summary>The default log with one digit of one telemetry line changed.</summary>
    public string EditedLog => File("edited.jsonl");

    /// <summary>1-based number of the edited line.</summary>
    public long EditedLine { get; private set; }

    public long DefaultSeed { get; private set; }

    /// <summary>The post-mortem of <see cref="DefaultLog"/>, made on first use and shared.</summary>
    public string DefaultReport => _defaultReport.Value;

    public string File(string name) => Path.Combine(Directory, name);

    public async Task InitializeAsync()
    {
        var scenario = BuiltInScenarios.Default();
        DefaultSeed = scenario.Run.Seed;
        await Task.WhenAll(
            Task.Run(() => RunAsync(DefaultLog, DefaultSeed)),
            Task.Run(() => RunAsync(OtherSeedLog, DefaultSeed + 1)));

        var bytes = await System.IO.File.ReadAllBytesAsync(DefaultLog);
        var lineStarts = new List<int> { 0 };
        for (var i = 0; i < bytes.Length; i++)
        {
            if (bytes[i] == (byte)'\n' && i + 1 < bytes.Length) lineStarts.Add(i + 1);
        }

        // Cut: keep lines 1..k-1 whole and half of line k.
        var k = lineStarts.Count / 2;
        TruncatedAtLine = k;
        var cutAt = lineStarts[k - 1] + 40;
        await System.IO.File.WriteAllBytesAsync(TruncatedLog, bytes[..cutAt]);

        // Edit: the first digit after "depth_m": on a line a third of the way in becomes another digit.
        var edited = (byte[])bytes.Clone();
        var target = lineStarts.Count / 3;
        var line = System.Text.Encoding.UTF8.GetString(bytes, lineStarts[target - 1], lineStarts[target] - lineStarts[target - 1]);
        var at = line.IndexOf("\"depth_m\":", StringComparison.Ordinal);
        Assert.True(at > 0, "the edited line should carry a depth");
        var digit = lineStarts[target - 1] + at + "\"depth_m\":".Length;
        edited[digit] = edited[digit] == (byte)'1' ? (byte)'2' : (byte)'1';
        EditedLine = target;
        await System.IO.File.WriteAllBytesAsync(EditedLog, edited);
    }

    public Task DisposeAsync()
    {
        System.IO.Directory.Delete(Directory, recursive: true);
        return Task.CompletedTask;
    }

    private static async Task RunAsync(string path, long seed)
    {
        var scenario = BuiltInScenarios.Default();
        var manifest = RunCommand.ManifestFor(scenario, seed, scenario.Run.UntilS);
        using var writer = JournalWriter.Create(path, manifest);
        await JournaledRun.RunAsync(scenario, manifest, writer, KernelChoice.Sequential);
    }
}
