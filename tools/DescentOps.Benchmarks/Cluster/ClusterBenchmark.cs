using System.Diagnostics;
using System.Globalization;
using System.Text.Json;
using System.Text.RegularExpressions;
using DescentOps.Campaigns;
using DescentOps.Cluster;
using DescentOps.Engine.Randomness;
using DescentOps.Scenarios;
using DescentOps.Scenarios.Loading;

namespace DescentOps.Benchmarks.Cluster;

/// <summary>
/// A clustered campaign with one worker process and with two, beside a local campaign, in one sitting. Cores: the local
/// campaign (<c>--jobs 1</c>) and worker A run on core 0, worker B on core 1 (taskset), and this process, which is the
/// campaign node (<c>--jobs 0</c>: it only hands out runs and stores results), is pinned to core 1. Rates are counted from
/// the moment the first worker joined to the last stored result, so process start-up and joining are left out, as the
/// local campaign's own rate leaves out its start-up (it counts from just before its first run to its last). Ratios only, never a timed assertion.
/// </summary>
public static partial class ClusterBenchmark
{
    public static async Task<int> RunAsync(string[] args, TextWriter output)
    {
        var runs = Option(args, "--runs", 40);
        var name = args.SkipWhile(a => a != "--scenario").Skip(1).FirstOrDefault() ?? BuiltInScenarios.DefaultName;
        var cli = args.SkipWhile(a => a != "--cli").Skip(1).FirstOrDefault() ?? BuiltCli();
        var c = CultureInfo.InvariantCulture;
        if (!File.Exists(cli))
        {
            output.WriteLine($"no built command line at {cli}: run `dotnet build -c Release src/DescentOps.Cli` first, or give --cli PATH");
            return 2;
        }

        if (Environment.ProcessorCount < 2 || !OperatingSystem.IsLinux() || !File.Exists("/usr/bin/taskset"))
        {
            output.WriteLine("this benchmark gives each worker a core of its own: it needs 2 cores and taskset (Linux)");
            return 2;
        }

        var version = (await Capture("dotnet", [cli, "--version"]).ConfigureAwait(false)).Trim();
        var scenario = ScenarioLoader.LoadText(BuiltInScenarios.Text(name), "builtin:" + name);
        var plan = new CampaignPlan(scenario, [CampaignVariant.Baseline], scenario.Run.Seed, scenario.Run.UntilS, version, RandomStream.AlgorithmName);
        var settings = new Dictionary<string, string>
        {
            ["scenario_name"] = scenario.Name,
            ["scenario_text"] = scenario.SourceText,
            ["seed"] = plan.Seed.ToString(c),
            ["until_s"] = plan.UntilS.ToString("R", c),
            ["tool_version"] = version,
            ["random"] = RandomStream.AlgorithmName,
            ["variants"] = "[\"baseline\"]",
            ["changes"] = "{\"baseline\":null}",
        };
        output.WriteLine(string.Create(c, $"cluster benchmark: scenario {name}, {runs} runs per measurement, {Environment.ProcessorCount} core(s); local campaign and worker A on core 0, worker B and the campaign node (this process) on core 1"));
        if (OperatingSystem.IsLinux()) Process.GetCurrentProcess().ProcessorAffinity = 0b10;
        var scratch = Directory.CreateTempSubdirectory("descentops-cluster-bench-").FullName;
        try
        {
            // 1. A local campaign on one core, its own runs/s line.
            var localOut = await Capture("taskset", ["-c", "0", "dotnet", cli, "campaign", name, "--runs", runs.ToString(c), "--jobs", "1", "--output", Path.Combine(scratch, "local")]).ConfigureAwait(false);
            var local = double.Parse(RateLine().Match(localOut).Groups[1].Value, c);
            output.WriteLine(string.Create(c, $"  local campaign, 1 thread (core 0)      {local,7:F3} runs/s"));

            // 2 and 3. The campaign node here, with one worker process and with two.
            var (one, _) = await Clustered(plan, settings, runs, cli, [0], Path.Combine(scratch, "one")).ConfigureAwait(false);
            output.WriteLine(string.Create(c, $"  cluster, 1 worker (core 0)             {one,7:F3} runs/s  (per-run overhead over local: {(local / one) - 1:P1})"));
            var (two, split) = await Clustered(plan, settings, runs, cli, [0, 1], Path.Combine(scratch, "two")).ConfigureAwait(false);
            output.WriteLine(string.Create(c, $"  cluster, 2 workers (cores 0 and 1)     {two,7:F3} runs/s  (two workers / one: {two / one:F2}x; runs per worker {split})"));
            output.WriteLine($"  load average while measuring (1, 5, 15 min): {LoadAverage()}; other processes share these cores, so ratios hold only on a quiet machine");
            return 0;
        }
        finally
        {
            Directory.Delete(scratch, recursive: true);
        }
    }

    /// <summary>Runs/s from the first worker's joining to the last stored result, with one worker process per listed core.</summary>
    private static async Task<(double RunsPerS, string Split)> Clustered(CampaignPlan plan, Dictionary<string, string> settings, int runs, string cli, int[] cores, string dir)
    {
        Directory.CreateDirectory(dir);
        using var store = CampaignStore.Open(Path.Combine(dir, "campaign.sqlite"));
        var clock = Stopwatch.StartNew();
        var stamps = new List<double>();
        var setup = new DispatcherSetup(JsonSerializer.Serialize(settings), plan, [.. Enumerable.Range(0, runs).Select(i => new RunKey(CampaignVariant.BaselineName, i))],
            plan.ToolVersion, null, r => { stamps.Add(clock.Elapsed.TotalSeconds); return store.Add(r); }, () => int.MaxValue, _ => { });
        await using var node = await CampaignNode.StartAsync(setup, new NodeAddress("127.0.0.1", 0), 0, _ => plan, false, _ => { }).ConfigureAwait(false);
        var workers = cores.Select(core =>
        {
            var start = new ProcessStartInfo("taskset") { RedirectStandardOutput = true, RedirectStandardError = true };
            foreach (var a in new[] { "-c", core.ToString(CultureInfo.InvariantCulture), "dotnet", cli, "worker", "--join", node.Address.ToString(), "--jobs", "1" }) start.ArgumentList.Add(a);
            var p = Process.Start(start)!;
            var stdout = p.StandardOutput.ReadToEndAsync();
            _ = p.StandardError.ReadToEndAsync();
            return (Process: p, Stdout: stdout);
        }).ToList();
        double joined;
        try
        {
            while (node.Status.Workers == 0 && !node.Completion.IsCompleted) await Task.Delay(5).ConfigureAwait(false);
            joined = clock.Elapsed.TotalSeconds;
            await node.Completion.WaitAsync(TimeSpan.FromMinutes(30)).ConfigureAwait(false);
        }
        finally
        {
            foreach (var (w, _) in workers)
            {
                using (var term = Process.Start("kill", ["-TERM", w.Id.ToString(CultureInfo.InvariantCulture)])) await term.WaitForExitAsync().ConfigureAwait(false);
            }

            foreach (var (w, _) in workers)
            {
                if (!w.WaitForExit(TimeSpan.FromSeconds(30))) w.Kill();
                await w.WaitForExitAsync().ConfigureAwait(false);
                w.Dispose();
            }
        }

        var split = new List<string>();
        foreach (var (_, stdout) in workers) split.Add(WorkerRuns().Match(await stdout.ConfigureAwait(false)) is { Success: true } m ? m.Groups[1].Value : "?");
        return (stamps.Count / (stamps[^1] - joined), string.Join(" + ", split));
    }

    [GeneratedRegex(@"\(([0-9.]+) runs/s\)")]
    private static partial Regex RateLine();

    [GeneratedRegex(@"worker stopped: ([0-9]+) run")]
    private static partial Regex WorkerRuns();

    private static async Task<string> Capture(string file, string[] arguments)
    {
        var start = new ProcessStartInfo(file) { RedirectStandardOutput = true, RedirectStandardError = true };
        foreach (var a in arguments) start.ArgumentList.Add(a);
        using var p = Process.Start(start)!;
        var stdout = p.StandardOutput.ReadToEndAsync();
        var stderr = p.StandardError.ReadToEndAsync();
        await p.WaitForExitAsync().ConfigureAwait(false);
        if (p.ExitCode != 0) throw new InvalidOperationException($"{file} {string.Join(' ', arguments)} failed ({p.ExitCode}): {await stderr.ConfigureAwait(false)}");
        return await stdout.ConfigureAwait(false);
    }

    private static string LoadAverage() => File.Exists("/proc/loadavg") ? string.Join(", ", File.ReadAllText("/proc/loadavg").Split(' ').Take(3)) : "unknown";

    private static string BuiltCli()
    {
        for (var folder = new DirectoryInfo(AppContext.BaseDirectory); folder is not null; folder = folder.Parent)
        {
            var candidate = Path.Combine(folder.FullName, "src", "DescentOps.Cli", "bin", "Release", "net10.0", "descentops.dll");
            if (File.Exists(candidate)) return candidate;
        }

        return "src/DescentOps.Cli/bin/Release/net10.0/descentops.dll";
    }

    private static int Option(string[] args, string name, int fallback)
    {
        var at = Array.IndexOf(args, name);
        return at >= 0 && at + 1 < args.Length ? int.Parse(args[at + 1], CultureInfo.InvariantCulture) : fallback;
    }
}
