using DescentOps.Cli.Running;
using DescentOps.Engine.Randomness;
using DescentOps.Journal;
using DescentOps.Mission.Running;
using DescentOps.Scenarios;
using DescentOps.Scenarios.Loading;

namespace DescentOps.Mission.Tests.Onboard;

/// <summary>
/// On-board sampling at the frame interval with crossings at samples is what the on-board rules always had: every
/// built-in scenario given that section writes its golden log byte for byte (the manifest carries the scenario text
/// as committed, so only the run itself is compared).
/// </summary>
public sealed class OnboardGoldenLogTests
{
    public static TheoryData<string> Scenarios() => [.. BuiltInScenarios.Names];

    [Theory]
    [MemberData(nameof(Scenarios))]
    public async Task Sampling_at_the_frame_interval_reproduces_the_golden_log(string name)
    {
        var text = BuiltInScenarios.Text(name);
        var frame = ScenarioLoader.LoadText(text, name).Probe.TelemetryIntervalS;
        var run = text.LastIndexOf("\nrun:", StringComparison.Ordinal);
        var edited = text[..(run + 1)] + $"onboard_sampling:\n  interval: {frame} s\n  crossings: at_samples\n" + text[(run + 1)..];
        var scenario = ScenarioLoader.LoadText(edited, "builtin:" + name);
        Assert.NotNull(scenario.OnboardSampling);
        var until = name == "rough-shell.yaml" ? 3 * 86400.0 : 2 * 86400.0;
        var manifest = new RunManifest(GoldenLogTests.GoldenToolVersion, scenario.Name, text, scenario.Run.Seed, until, RandomStream.AlgorithmName);
        using var stream = new MemoryStream();
        using (var writer = JournalWriter.Create(stream, manifest))
        {
            await JournaledRun.RunAsync(scenario, manifest, writer, KernelChoice.Sequential);
        }

        var golden = await File.ReadAllBytesAsync(Path.Combine(GoldenFolder(), Path.ChangeExtension(name, ".jsonl")));
        Assert.True(golden.AsSpan().SequenceEqual(stream.ToArray()), $"{name}: the log with on-board sampling at the frame interval differs from its golden log");
    }

    private static string GoldenFolder()
    {
        for (var dir = new DirectoryInfo(AppContext.BaseDirectory); dir is not null; dir = dir.Parent)
        {
            var candidate = Path.Combine(dir.FullName, "tests", "golden");
            if (Directory.Exists(candidate)) return candidate;
        }

        throw new DirectoryNotFoundException("tests/golden");
    }
}
