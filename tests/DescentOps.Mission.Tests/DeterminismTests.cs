using System.Text;
using DescentOps.Mission.Running;
using DescentOps.Scenarios;

namespace DescentOps.Mission.Tests;

/// <summary>Same binary, scenario and seed: the same log, byte for byte, whatever the threads did.</summary>
public sealed class DeterminismTests
{
    [Fact]
    public async Task The_same_seed_twice_in_one_process_gives_byte_identical_logs()
    {
        // The run other tests share, made earlier in this process (or now), and a run of this test's own.
        var first = (await SharedRuns.OfDefaultAsync(KernelChoice.Actors)).Journal;
        var scenario = BuiltInScenarios.Default();
        var second = await MissionHarness.JournalBytesAsync(scenario, scenario.Run.Seed, KernelChoice.Actors);
        Assert.True(first.Length > 1_000_000, "the default run should log a whole descent");
        Assert.Equal(first, second);
    }

    [Fact]
    public async Task The_actor_kernel_writes_the_same_log_as_the_sequential_reference()
    {
        var actors = (await SharedRuns.OfDefaultAsync(KernelChoice.Actors)).Journal;
        var sequential = (await SharedRuns.OfDefaultAsync(KernelChoice.Sequential)).Journal;
        Assert.Equal(sequential, actors);
    }

    [Fact]
    public async Task A_separate_process_writes_the_same_bytes()
    {
        var inProcess = (await SharedRuns.OfDefaultAsync(KernelChoice.Actors)).Journal;

        var folder = ToolProcess.NewTempDirectory();
        var log = Path.Combine(folder, "run.jsonl");
        var (exit, stdout, stderr) = await ToolProcess.RunAsync(folder, "run", "--log", log);

        Assert.True(exit == 0, $"exit {exit}\n{stdout}\n{stderr}");
        Assert.Equal(inProcess, await File.ReadAllBytesAsync(log));
    }

    [Fact]
    public async Task A_different_seed_changes_the_draws_and_so_the_events()
    {
        var a = EventLines((await SharedRuns.OfDefaultAsync(seed: 1)).Journal);
        var b = EventLines((await SharedRuns.OfDefaultAsync(seed: 2)).Journal);

        // The descent itself draws nothing, so the logs agree until the vehicles' first randomized leg...
        var firstDifference = Enumerable.Range(0, Math.Min(a.Count, b.Count)).First(i => a[i] != b[i]);
        Assert.Contains("vehicle", a[firstDifference] + b[firstDifference]);
        // ...and differ after it.
        Assert.NotEqual(a.Skip(firstDifference), b.Skip(firstDifference));
    }

    /// <summary>Event lines without their chain values (which differ from line 1 on, because the seed is in the manifest).</summary>
    private static List<string> EventLines(byte[] journal) =>
        [.. Encoding.UTF8.GetString(journal).Split('\n')
            .Where(l => l.StartsWith("{\"type\":\"event\"", StringComparison.Ordinal))
            .Select(l => l[..l.LastIndexOf(",\"chain\"", StringComparison.Ordinal)])];
}
