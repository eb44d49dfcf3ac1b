using System.Collections.Concurrent;
using DescentOps.Mission.Running;
using DescentOps.Scenarios;
using DescentOps.Scenarios.Loading;

namespace DescentOps.Mission.Tests;

/// <summary>
/// Whole runs of unchanged built-in scenarios, each made once per test process and shared by the tests that only read
/// it: its journal bytes exactly as <c>descentops run</c> writes them, its records and its summary. Sharing is sound
/// because the same binary, scenario, seed and kernel give the same bytes, which <see cref="DeterminismTests"/> and
/// <see cref="GoldenLogTests"/> check with runs of their own. A test that changes a scenario runs it itself.
/// </summary>
internal static class SharedRuns
{
    private static readonly ConcurrentDictionary<(string Name, long? Seed, KernelChoice Kernel), Lazy<Task<RecordedRun>>> Runs = new();

    /// <summary>The built-in scenario <paramref name="name"/> (e.g. <c>default.yaml</c>), loaded as the command line loads it, run to its own limit.</summary>
    public static Task<RecordedRun> OfBuiltInAsync(string name, KernelChoice kernel = KernelChoice.Sequential, long? seed = null) =>
        Runs.GetOrAdd((name, seed, kernel), key => new Lazy<Task<RecordedRun>>(() => RunAsync(key.Name, key.Seed, key.Kernel))).Value;

    /// <summary>The built-in default scenario's shared run.</summary>
    public static Task<RecordedRun> OfDefaultAsync(KernelChoice kernel = KernelChoice.Sequential, long? seed = null) =>
        OfBuiltInAsync(BuiltInScenarios.DefaultName, kernel, seed);

    private static Task<RecordedRun> RunAsync(string name, long? seed, KernelChoice kernel)
    {
        var scenario = ScenarioLoader.LoadText(BuiltInScenarios.Text(name), "builtin:" + name);
        return MissionHarness.RecordAsync(scenario, seed ?? scenario.Run.Seed, kernel);
    }
}
