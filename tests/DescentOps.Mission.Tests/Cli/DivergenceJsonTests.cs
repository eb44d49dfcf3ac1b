using System.Text.Json;
using DescentOps.Cli.Commands;
using DescentOps.Cli.Running;
using DescentOps.Journal;
using DescentOps.Mission.Running;
using DescentOps.Tests.Shared;

namespace DescentOps.Mission.Tests.Cli;

/// <summary>A divergence between two journals reads the same in every command's JSON that reports one.</summary>
[Collection(InProcessCliCollection.Name)]
public sealed class DivergenceJsonTests
{
    /// <summary>The keys of a divergence object as the README documents them, in order.</summary>
    private static readonly string[] DivergenceKeys = ["line", "time_a_s", "time_b_s", "text_a", "text_b"];

    [Fact]
    public async Task Replay_and_diff_write_the_same_divergence_with_the_same_keys()
    {
        // A log with an intact chain whose manifest says seed 1 while its events came from seed 2: replay re-runs
        // seed 1 and parts from it where the draws differ (rough-shell draws its random bus sags at time 0). Diffing
        // the same log against an honest seed-1 log, in the same order, compares the same two runs.
        var folder = TestFolders.New();
        var scenario = TestScenario.BuiltIn("rough-shell.yaml").Load();
        var unreproducible = await WriteLogAsync(Path.Combine(folder, "seed1-run2.jsonl"), manifestSeed: 1, runSeed: 2, scenario);
        var honest = await WriteLogAsync(Path.Combine(folder, "seed1.jsonl"), manifestSeed: 1, runSeed: 1, scenario);

        var replay = await InProcessCli.RunAsync("replay", unreproducible, "--json", "--kernel", "sequential");
        var diff = await InProcessCli.RunAsync("diff", unreproducible, honest, "--json");

        Assert.True(replay.ExitCode == 8, replay.Stderr); // ExitCode.RunsDiffer
        Assert.True(diff.ExitCode == 8, diff.Stderr);
        using var replayed = JsonDocument.Parse(replay.Stdout);
        using var compared = JsonDocument.Parse(diff.Stdout);
        var fromReplay = replayed.RootElement.GetProperty("divergence");
        var fromDiff = compared.RootElement.GetProperty("first_divergence");
        Assert.Equal(DivergenceKeys, fromReplay.EnumerateObject().Select(p => p.Name));
        Assert.Equal(DivergenceKeys, fromDiff.EnumerateObject().Select(p => p.Name));

        // The manifests are the same, so the chains agree up to the first differing event: both commands find it on
        // the same line at the same simulated times. (The texts differ: replay shows whole lines, diff an event's content.)
        Assert.Equal(fromReplay.GetProperty("line").GetInt64(), fromDiff.GetProperty("line").GetInt64());
        Assert.Equal(fromReplay.GetProperty("time_a_s").GetDouble(), fromDiff.GetProperty("time_a_s").GetDouble());
        Assert.Equal(fromReplay.GetProperty("time_b_s").GetDouble(), fromDiff.GetProperty("time_b_s").GetDouble());
        foreach (var side in new[] { fromReplay, fromDiff })
        {
            Assert.Contains("random-bus-sag", side.GetProperty("text_a").GetString(), StringComparison.Ordinal);
            Assert.Contains("random-bus-sag", side.GetProperty("text_b").GetString(), StringComparison.Ordinal);
        }
    }

    [Fact]
    public async Task Replay_and_diff_write_null_for_runs_that_do_not_diverge()
    {
        var folder = TestFolders.New();
        var scenario = TestScenario.BuiltIn("rough-shell.yaml").Load();
        var log = await WriteLogAsync(Path.Combine(folder, "seed1.jsonl"), manifestSeed: 1, runSeed: 1, scenario);

        var replay = await InProcessCli.RunAsync("replay", log, "--json", "--kernel", "sequential");
        var diff = await InProcessCli.RunAsync("diff", log, log, "--json");

        Assert.True(replay.ExitCode == 0, replay.Stderr);
        Assert.True(diff.ExitCode == 0, diff.Stderr);
        using var replayed = JsonDocument.Parse(replay.Stdout);
        using var compared = JsonDocument.Parse(diff.Stdout);
        Assert.Equal(JsonValueKind.Null, replayed.RootElement.GetProperty("divergence").ValueKind);
        Assert.Equal(JsonValueKind.Null, compared.RootElement.GetProperty("first_divergence").ValueKind);
    }

    /// <summary>One simulated hour of <paramref name="scenario"/> run on <paramref name="runSeed"/>, under a manifest that says <paramref name="manifestSeed"/>.</summary>
    private static async Task<string> WriteLogAsync(string path, long manifestSeed, long runSeed, Scenarios.Model.Scenario scenario)
    {
        const double UntilS = 3600;
        using var writer = JournalWriter.Create(path, RunCommand.ManifestFor(scenario, manifestSeed, UntilS));
        await JournaledRun.RunAsync(scenario, RunCommand.ManifestFor(scenario, runSeed, UntilS), writer, KernelChoice.Sequential);
        return path;
    }
}
