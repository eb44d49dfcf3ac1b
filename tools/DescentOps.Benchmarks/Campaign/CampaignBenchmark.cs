using System.Diagnostics;
using System.Globalization;
using DescentOps.Campaigns;
using DescentOps.Records;
using DescentOps.Engine.Randomness;
using DescentOps.Mission.Running;
using DescentOps.Scenarios;
using DescentOps.Scenarios.Loading;

namespace DescentOps.Benchmarks.Campaign;

/// <summary>
/// A campaign's cost per run beside one <c>descentops run</c> process, measured in one sitting: the process (start-up,
/// actor system, log file), the campaign executor on one thread (sequential kernel, journal encoded and chained but not
/// written), the same kernel with no journal at all, and the executor on K threads; then the managed heap after N and 2N
/// runs, to show memory stays flat.
/// </summary>
public static class CampaignBenchmark
{
    public static async Task<int> RunAsync(string[] args, TextWriter output)
    {
        var runs = Option(args, "--runs", 8);
        var jobs = Option(args, "--jobs", Environment.ProcessorCount);
        var name = args.SkipWhile(a => a != "--scenario").Skip(1).FirstOrDefault() ?? BuiltInScenarios.DefaultName;
        var scenario = ScenarioLoader.LoadText(BuiltInScenarios.Text(name), "builtin:" + name);
        var plan = new CampaignPlan(scenario, [CampaignVariant.Baseline], scenario.Run.Seed, scenario.Run.UntilS, "benchmark", RandomStream.AlgorithmName);
        var c = CultureInfo.InvariantCulture;
        output.WriteLine(string.Create(c, $"campaign benchmark: scenario {name}, {runs} runs per measurement, {jobs} worker(s), {Environment.ProcessorCount} core(s)"));

        // 1. One `descentops run` process, as a user starts it.
        // The command line is not referenced here (only tests may reference it): its Release build is found in the tree.
        var cli = args.SkipWhile(a => a != "--cli").Skip(1).FirstOrDefault() ?? BuiltCli();
        if (!File.Exists(cli))
        {
            output.WriteLine($"no built command line at {cli}: run `dotnet build -c Release src/DescentOps.Cli` first, or give --cli PATH");
            return 2;
        }

        var log = Path.Combine(Path.GetTempPath(), $"descentops-bench-{Environment.ProcessId}.jsonl");
        var process = Process.Start(new ProcessStartInfo("dotnet", $"\"{cli}\" run {name} --log \"{log}\"") { RedirectStandardOutput = true, RedirectStandardError = true })!;
        var wall = Stopwatch.StartNew();
        var reading = process.StandardOutput.ReadToEndAsync();
        var processCpuS = 0.0;

        // Linux forgets a process's CPU time once it has exited, so it is sampled while the run lasts (to within 20 ms).
        while (!process.HasExited)
        {
            try
            {
                processCpuS = process.TotalProcessorTime.TotalSeconds;
            }
            catch (InvalidOperationException)
            {
                break;
            }

            Thread.Sleep(20);
        }

        await reading.ConfigureAwait(false);
        await process.WaitForExitAsync().ConfigureAwait(false);
        wall.Stop();
        var processWallS = wall.Elapsed.TotalSeconds;
        File.Delete(log);
        output.WriteLine(string.Create(c, $"  one `descentops run` process        {processWallS,8:F2} s wall  {processCpuS,8:F2} s CPU"));

        // 2. Warm up, then the executor on one thread.
        RunExecutor.Execute(plan, plan.Spec(CampaignVariant.BaselineName, 0));
        var (oneWall, oneCpu) = Timed(() =>
        {
            for (var i = 0; i < runs; i++) RunExecutor.Execute(plan, plan.Spec(CampaignVariant.BaselineName, i));
        });
        output.WriteLine(string.Create(c, $"  campaign run, one thread            {oneWall / runs,8:F2} s wall  {oneCpu / runs,8:F2} s CPU per run  ({oneCpu / runs / processCpuS:P0} of the process's CPU)"));

        // 3. The kernel alone: no journal encoding, no chain.
        var (bareWall, bareCpu) = Timed(() =>
        {
            for (var i = 0; i < runs; i++) MissionRunner.RunAsync(scenario, RunSeeds.ForRun(plan.Seed, i), plan.UntilS, NullJournalSink.Instance, KernelChoice.Sequential).GetAwaiter().GetResult();
        });
        output.WriteLine(string.Create(c, $"  kernel alone (no journal), one thread {bareWall / runs,6:F2} s wall  {bareCpu / runs,8:F2} s CPU per run  (encoding and chaining: {1 - (bareCpu / oneCpu):P0} of a campaign run)"));

        // 4. K workers, as the campaign command runs them.
        var next = -1;
        var (parallelWall, _) = Timed(() =>
        {
            var threads = Enumerable.Range(0, jobs).Select(_ => new Thread(() =>
            {
                int k;
                while ((k = Interlocked.Increment(ref next)) < runs) RunExecutor.Execute(plan, plan.Spec(CampaignVariant.BaselineName, k));
            })).ToList();
            threads.ForEach(t => t.Start());
            threads.ForEach(t => t.Join());
        });
        var rate = runs / parallelWall;
        output.WriteLine(string.Create(c, $"  campaign, {jobs} worker(s)                {rate,8:F2} runs/s  (1,000 runs would take {1000 / rate / 60:F1} min; a run process every run: {1000 * processWallS / jobs / 60:F1} min)"));

        // 5. Memory after N and after 2N more runs: a campaign keeps nothing per run in memory.
        GC.Collect();
        var heapN = GC.GetTotalMemory(forceFullCollection: true);
        for (var i = 0; i < 2 * runs; i++) RunExecutor.Execute(plan, plan.Spec(CampaignVariant.BaselineName, i));
        GC.Collect();
        var heap3N = GC.GetTotalMemory(forceFullCollection: true);
        output.WriteLine(string.Create(c, $"  managed heap after {runs} runs {heapN / 1e6:F1} MB, after {3 * runs} runs {heap3N / 1e6:F1} MB"));
        return 0;
    }

    private static string BuiltCli()
    {
        for (var folder = new DirectoryInfo(AppContext.BaseDirectory); folder is not null; folder = folder.Parent)
        {
            var candidate = Path.Combine(folder.FullName, "src", "DescentOps.Cli", "bin", "Release", "net10.0", "descentops.dll");
            if (File.Exists(candidate)) return candidate;
        }

        return "src/DescentOps.Cli/bin/Release/net10.0/descentops.dll";
    }

    private static (double WallS, double CpuS) Timed(Action action)
    {
        var cpu0 = Process.GetCurrentProcess().TotalProcessorTime;
        var wall = Stopwatch.StartNew();
        action();
        wall.Stop();
        return (wall.Elapsed.TotalSeconds, (Process.GetCurrentProcess().TotalProcessorTime - cpu0).TotalSeconds);
    }

    private static int Option(string[] args, string name, int fallback)
    {
        var at = Array.IndexOf(args, name);
        return at >= 0 && at + 1 < args.Length ? int.Parse(args[at + 1], CultureInfo.InvariantCulture) : fallback;
    }
}
