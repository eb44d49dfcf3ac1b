using System.Text;
using DescentOps.Cli.Running;
using DescentOps.Engine.Randomness;
using DescentOps.Journal;
using DescentOps.Mission.Running;
using DescentOps.Scenarios;
using DescentOps.Scenarios.Loading;
using DescentOps.Tests.Shared;

namespace DescentOps.Mission.Tests;

/// <summary>
/// Short runs of every built-in scenario compared byte for byte with the logs committed in tests/golden.
/// A change that alters a log must do so on purpose: refresh them with tools/refresh-golden-logs.sh and say why
/// in the commit. The manifest's tool version is fixed to <see cref="GoldenToolVersion"/> so that a new commit
/// (which changes the informational version) does not change the bytes.
/// </summary>
public sealed class GoldenLogTests
{
    public const string GoldenToolVersion = "golden";

    private const string RefreshVariable = "DESCENTOPS_REFRESH_GOLDEN";

    /// <summary>Run length per scenario: long enough to reach the first fault where that comes early, short enough for a small log.</summary>
    private static double UntilSecondsOf(string scenarioName) => scenarioName switch
    {
        "rough-shell.yaml" => 3 * 86400.0, // the scheduled tilt-sensor noise starts at 2 d
        _ => 2 * 86400.0,
    };

    public static TheoryData<string> Scenarios() => [.. BuiltInScenarios.Names];

    [Theory]
    [MemberData(nameof(Scenarios))]
    public async Task Every_built_in_scenario_writes_its_golden_log_with_both_kernels(string name)
    {
        var path = Path.Combine(GoldenFolder, Path.ChangeExtension(name, ".jsonl"));
        var sequential = await JournalBytesAsync(name, KernelChoice.Sequential);
        if (Environment.GetEnvironmentVariable(RefreshVariable) == "1")
        {
            await File.WriteAllBytesAsync(path, sequential);
        }

        Assert.True(File.Exists(path), $"no golden log {path}; run tools/refresh-golden-logs.sh");
        AssertSameBytes(await File.ReadAllBytesAsync(path), sequential, path, "sequential");
        AssertSameBytes(sequential, await JournalBytesAsync(name, KernelChoice.Actors), path, "actors");
    }

    [Fact]
    public void No_golden_log_is_left_without_its_scenario()
    {
        var expected = BuiltInScenarios.Names.Select(n => Path.ChangeExtension(n, ".jsonl")).Order(StringComparer.Ordinal);
        var present = Directory.GetFiles(GoldenFolder, "*.jsonl").Select(Path.GetFileName).Order(StringComparer.Ordinal);
        Assert.Equal(expected, present);
    }

    private static async Task<byte[]> JournalBytesAsync(string name, KernelChoice kernel)
    {
        var scenario = ScenarioLoader.LoadText(BuiltInScenarios.Text(name), "builtin:" + name);
        var manifest = new RunManifest(GoldenToolVersion, scenario.Name, scenario.SourceText, scenario.Run.Seed, UntilSecondsOf(name), RandomStream.AlgorithmName);
        using var stream = new MemoryStream();
        using (var writer = JournalWriter.Create(stream, manifest))
        {
            await JournaledRun.RunAsync(scenario, manifest, writer, kernel);
        }

        return stream.ToArray();
    }

    private static void AssertSameBytes(byte[] expected, byte[] actual, string path, string kernel)
    {
        if (expected.AsSpan().SequenceEqual(actual)) return;
        var a = Encoding.UTF8.GetString(expected).Split('\n');
        var b = Encoding.UTF8.GetString(actual).Split('\n');
        var line = Enumerable.Range(0, Math.Min(a.Length, b.Length)).FirstOrDefault(i => a[i] != b[i], Math.Min(a.Length, b.Length));
        Assert.Fail($"{path} ({kernel} kernel) differs first at line {line + 1}\n golden: {At(a, line)}\n now:    {At(b, line)}\n" +
                    "If the change is on purpose, run tools/refresh-golden-logs.sh and say why in the commit.");
    }

    private static string At(string[] lines, int i) => i < lines.Length ? lines[i] : "(end of log)";

    private static string GoldenFolder => Path.Combine(RepositoryRoot.Path, "tests", "golden");
}
