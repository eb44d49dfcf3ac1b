using System.CommandLine;
using System.Globalization;
using System.Text.Json;
using System.Text.Json.Nodes;
using DescentOps.Campaigns;
using DescentOps.Cli.Files;
using DescentOps.Cli.Running;
using DescentOps.Cli.Terminal;
using DescentOps.Engine.Randomness;
using DescentOps.Journal;
using DescentOps.Mission.Running;
using DescentOps.Scenarios.Loading;

namespace DescentOps.Cli.Commands;

/// <summary>
/// <c>descentops campaign SCENARIO --runs N [--seed S] [--versus CHANGE]... [--jobs K] [--output DIR] [--precision H]
/// [--resume] [--keep-logs failed|all]</c>, with <c>campaign show DIR</c> and <c>campaign log DIR --run I</c>.
/// </summary>
public static class CampaignCommand
{
    private const string Database = "campaign.sqlite";

    /// <summary>Indices per precision check: the stop is decided on whole blocks so it does not depend on which worker finished first.</summary>
    private const int PrecisionBlock = 10;

    /// <summary>Bounds on the options, so a slip of the keyboard cannot ask for years of work or thousands of threads.</summary>
    public const int MaxRuns = 1_000_000;
    public const int MaxJobs = 256;
    public const int MaxVariants = 32;

    public static Command Create()
    {
        var scenarioArgument = new Argument<string>("SCENARIO") { Description = "Scenario file, or the name of a built-in scenario." };
        var runsOption = new Option<int>("--runs") { Description = "Runs per variant (the most, with --precision).", Required = true };
        var seedOption = new Option<long?>("--seed") { Description = "Campaign seed (default: the scenario's run.seed); run i's seed is derived from it." };
        var versusOption = new Option<string[]>("--versus") { Description = "A change file (as branch --with takes) giving one more variant; repeatable.", AllowMultipleArgumentsPerToken = false };
        var jobsOption = new Option<int?>("--jobs") { Description = "Parallel workers (default: the machine's cores)." };
        var outputOption = new Option<string?>("--output", "-o") { Description = "Results folder (default logs/<scenario>-campaign-seed<S>/)." };
        var precisionOption = new Option<double?>("--precision") { Description = "Stop when every variant's 95 % interval on the success rate is narrower than ± this share (e.g. 0.05)." };
        var resumeOption = new Option<bool>("--resume") { Description = "Continue an interrupted campaign in the folder; finished runs are neither repeated nor counted twice." };
        var keepOption = new Option<string?>("--keep-logs") { Description = "Keep the event logs of 'failed' runs or of 'all' runs in DIR/logs (default: none; any run's log can be regenerated)." };
        var clusterOptions = new ClusterCampaign.Options();
        var command = new Command("campaign", "Run a scenario many times over its uncertain inputs, with variants on common seeds, and say how often each succeeds.")
        {
            scenarioArgument, runsOption, seedOption, versusOption, jobsOption, outputOption, precisionOption, resumeOption, keepOption,
        };
        foreach (var option in clusterOptions.All) command.Options.Add(option);
        command.Subcommands.Add(Show());
        command.Subcommands.Add(Log());
        command.SetAction((parse, cancel) => Task.FromResult(Execute(
            parse.GetValue(scenarioArgument)!,
            parse.GetValue(runsOption),
            parse.GetValue(seedOption),
            parse.GetValue(versusOption) ?? [],
            parse.GetValue(jobsOption),
            parse.GetValue(outputOption),
            parse.GetValue(precisionOption),
            parse.GetValue(resumeOption),
            parse.GetValue(keepOption),
            clusterOptions.Read(parse))));
        return command;
    }

    /// <summary>The plan a campaign folder's settings describe (for show, log and resume).</summary>
    public static CampaignPlan PlanOf(IReadOnlyDictionary<string, string> settings)
    {
        var scenario = ScenarioLoader.LoadText(settings["scenario_text"], "campaign:" + settings["scenario_name"]);
        var changes = JsonSerializer.Deserialize<Dictionary<string, string?>>(settings["changes"]) ?? [];
        var names = JsonSerializer.Deserialize<List<string>>(settings["variants"]) ?? [];
        return new CampaignPlan(
            scenario,
            [.. names.Select(n => new CampaignVariant(n, changes.GetValueOrDefault(n)))],
            long.Parse(settings["seed"], CultureInfo.InvariantCulture),
            double.Parse(settings["until_s"], CultureInfo.InvariantCulture),
            settings["tool_version"],
            settings["random"]);
    }

    private static int Execute(string scenarioArgument, int runs, long? seedOption, string[] versus, int? jobs, string? output, double? precision, bool resume, string? keepLogs, ClusterCampaign.Request? cluster = null)
    {
        if (runs < 1) throw new UsageException("--runs: a campaign needs at least 1 run");
        if (runs > MaxRuns) throw new UsageException(string.Create(CultureInfo.InvariantCulture, $"--runs: at most {MaxRuns} runs per variant (asked for {runs}); use --precision to stop when the intervals are narrow enough"));
        if (jobs is < 1 && !(jobs == 0 && cluster is not null)) throw new UsageException(cluster is null ? "--jobs: at least 1 worker" : "--jobs: 0 (the campaign node only dispatches) or more");
        if (cluster is not null && keepLogs is not null) throw new UsageException("--keep-logs: not with --cluster (the runs happen on other machines); regenerate any run's log with 'campaign log'");
        if (jobs > MaxJobs) throw new UsageException(string.Create(CultureInfo.InvariantCulture, $"--jobs: at most {MaxJobs} workers (asked for {jobs}); the machine has {Environment.ProcessorCount} cores"));
        if (versus.Length + 1 > MaxVariants) throw new UsageException(string.Create(CultureInfo.InvariantCulture, $"--versus: at most {MaxVariants - 1} change files (given {versus.Length})"));
        if (precision is { } h && !(h > 0 && h <= 0.5)) throw new UsageException("--precision: a half-width between 0 and 0.5 (e.g. 0.05 for ±5 %)");
        if (keepLogs is not (null or "failed" or "all")) throw new UsageException("--keep-logs: 'failed' or 'all'");

        var scenario = ScenarioSource.Load(scenarioArgument);
        var seed = seedOption ?? scenario.Run.Seed;
        var variants = new List<CampaignVariant> { CampaignVariant.Baseline };
        foreach (var path in versus)
        {
            if (!File.Exists(path)) throw new ScenarioException([new ScenarioError(new SourceLocation(path, 1, 1), "--versus", "no such change file")]);
            variants.Add(new CampaignVariant(Path.GetFileNameWithoutExtension(path), File.ReadAllText(path), path));
        }

        var plan = new CampaignPlan(scenario, variants, seed, scenario.Run.UntilS, ToolInfo.Version, RandomStream.AlgorithmName);

        // Refused before anything runs: what `run` would refuse of any variant, and inputs the truncation cannot draw.
        foreach (var variant in variants)
        {
            var refusals = MissionPreflight.Errors(plan.ScenarioOf(variant.Name));
            if (refusals.Count > 0) throw new ScenarioException(refusals);
            _ = UncertainDraw.Draw(plan.ScenarioOf(variant.Name), RunSeeds.ForRun(seed, 0));
        }
        var settings = new Dictionary<string, string>(StringComparer.Ordinal)
        {
            ["scenario_name"] = scenario.Name,
            ["scenario_sha256"] = plan.ManifestFor(CampaignVariant.BaselineName, 0).ScenarioSha256,
            ["scenario_text"] = scenario.SourceText,
            ["seed"] = seed.ToString(CultureInfo.InvariantCulture),
            ["until_s"] = plan.UntilS.ToString("R", CultureInfo.InvariantCulture),
            ["tool_version"] = ToolInfo.Version,
            ["random"] = RandomStream.AlgorithmName,
            ["seed_scheme"] = RunSeeds.Scheme,
            ["variants"] = JsonSerializer.Serialize(variants.Select(v => v.Name).ToList()),
            ["changes"] = JsonSerializer.Serialize(variants.ToDictionary(v => v.Name, v => v.ChangeText)),
        };

        var dir = Path.GetFullPath(output ?? Path.Combine("logs", $"{scenario.Name}-campaign-seed{seed}"));
        var dbPath = Path.Combine(dir, Database);
        if (File.Exists(dbPath) && !resume) throw new OutputRefusedException($"{dir} already holds a campaign; add --resume to continue it, or name another folder with --output");
        if (!File.Exists(dbPath) && resume) throw new UsageException($"--resume: {dir} holds no campaign to continue");
        Directory.CreateDirectory(dir);
        using var store = CampaignStore.Open(dbPath);
        var stored = store.Settings();
        if (stored.Count > 0)
        {
            foreach (var key in new[] { "scenario_sha256", "seed", "until_s", "tool_version", "variants", "changes" })
            {
                if (stored.GetValueOrDefault(key) != settings[key])
                {
                    throw new UsageException($"--resume: the campaign in {dir} was made with another {key.Replace('_', ' ')}; a resumed campaign must be the same campaign");
                }
            }
        }

        settings["runs"] = runs.ToString(CultureInfo.InvariantCulture);
        settings["precision"] = precision?.ToString("R", CultureInfo.InvariantCulture) ?? "";
        store.SaveSettings(settings);

        // Memory stays flat with the number of runs: the work is counted, not listed (run k is index k / V of variant
        // k mod V), each record goes to the store as it arrives, and the per-run successes are kept only for --precision.
        var done = store.Done();
        var success = precision is null
            ? new Dictionary<(string Variant, int Index), bool>()
            : store.Runs().ToDictionary(r => (r.Variant, r.Index), r => r.Success);
        var total = (long)runs * variants.Count;
        var workers = jobs ?? Environment.ProcessorCount;
        Console.Out.WriteLine(string.Create(CultureInfo.InvariantCulture,
            $"DescentOps {ToolInfo.Version}: campaign of '{scenario.Name}', {runs} runs x {variants.Count} variant(s), seed {seed}, {workers} worker(s){(cluster is null ? "" : " here and more as they join the cluster")}{(done.Count > 0 ? $", {done.Count} run(s) already stored" : "")}"));

        using var interruption = Interruption.Watch();
        using var cancel = CancellationTokenSource.CreateLinkedTokenSource(interruption.Token);
        var progress = new CampaignProgress(runs * variants.Count, done.Count);
        var next = -1L;
        var stopAt = runs;
        var checkedBlocks = 0;
        var gate = new Lock();
        Exception? failure = null;
        var logsDir = Path.Combine(dir, "logs");
        if (keepLogs is not null) Directory.CreateDirectory(logsDir);

        void Worker()
        {
            while (!cancel.IsCancellationRequested)
            {
                var k = Interlocked.Increment(ref next);
                if (k >= total) return;
                var (variant, index) = (variants[(int)(k % variants.Count)].Name, (int)(k / variants.Count));
                if (index >= Volatile.Read(ref stopAt) || done.Contains((variant, index))) continue;
                try
                {
                    var spec = plan.Spec(variant, index);
                    var record = RunExecutor.Execute(plan, spec, keepLogs == "all" ? LogPath(logsDir, spec) : null);
                    if (keepLogs == "failed" && !record.Success) RunExecutor.Execute(plan, spec, LogPath(logsDir, spec));
                    Accept(record);
                }
#pragma warning disable CA1031 // The first failure stops the campaign and is rethrown on the calling thread.
                catch (Exception exception)
#pragma warning restore CA1031
                {
                    lock (gate) failure ??= exception;
                    cancel.Cancel();
                }
            }
        }

        bool Accept(RunRecord record)
        {
            var stored = store.Add(record);
            if (precision is { } half)
            {
                lock (gate)
                {
                    success[(record.Variant, record.Index)] = record.Success;
                    CheckPrecision(half);
                }
            }

            progress.RunFinished();
            return stored;
        }

        void CheckPrecision(double half)
        {
            while (true)
            {
                var end = (checkedBlocks + 1) * PrecisionBlock;
                if (end > runs) return;
                if (!variants.All(v => Enumerable.Range(0, end).All(i => success.ContainsKey((v.Name, i))))) return;
                checkedBlocks++;
                if (variants.All(v => CampaignSummary.HalfWidth(Enumerable.Range(0, end).Count(i => success[(v.Name, i)]), end) < half))
                {
                    Volatile.Write(ref stopAt, Math.Min(Volatile.Read(ref stopAt), end));
                    return;
                }
            }
        }

        if (precision is { } h0)
        {
            lock (gate) CheckPrecision(h0);
        }

        if (cluster is not null)
        {
            // The cluster's dispatcher lists the runs still to do (a key each), unlike the local workers, which count them.
            var work = Enumerable.Range(0, runs).SelectMany(i => variants.Select(v => (v.Name, Index: i))).Where(k => !done.Contains(k)).ToList();
            failure = ClusterCampaign.Run(cluster, plan, settings, work, workers, Accept, () => Volatile.Read(ref stopAt), progress, cancel.Token);
        }
        else
        {
            var threads = Enumerable.Range(0, workers).Select(_ => new Thread(Worker) { IsBackground = true }).ToList();
            threads.ForEach(t => t.Start());
            threads.ForEach(t => t.Join());
        }
        progress.Done();
        if (failure is not null) throw failure;
        if (cancel.IsCancellationRequested)
        {
            Console.Error.WriteLine($"descentops: campaign interrupted; {store.Done().Count} run(s) are stored in {dbPath}. Run the same command with --resume to continue.");
            return (int)ExitCode.Interrupted;
        }

        if (stopAt < runs)
        {
            store.RemoveFrom(stopAt);
            store.SaveSettings(new Dictionary<string, string> { ["runs_used"] = stopAt.ToString(CultureInfo.InvariantCulture) });
            Console.Out.WriteLine(string.Create(CultureInfo.InvariantCulture, $"  precision reached after {stopAt} runs per variant"));
        }

        var all = store.Runs();
        var summary = CampaignSummary.Build(store.Settings(), all);
        WriteAtomically(Path.Combine(dir, "summary.json"), CampaignSummary.ToJson(summary));
        WriteAtomically(Path.Combine(dir, "report.html"), CampaignReport.Render(summary, all));
        Print(summary);
        Console.Out.WriteLine(string.Create(CultureInfo.InvariantCulture, $"  {progress.DoneThisSession} run(s) in {progress.Elapsed.TotalSeconds:F1} s ({progress.RunsPerSecond:F2} runs/s)"));
        Console.Out.WriteLine($"  results               {dir} (campaign.sqlite, summary.json, report.html)");
        return (int)ExitCode.Ok;
    }

    private static string LogPath(string logsDir, RunSpec spec) =>
        Path.Combine(logsDir, string.Create(CultureInfo.InvariantCulture, $"{spec.Variant}-run{spec.Index}-seed{spec.Seed}.jsonl"));

    private static void WriteAtomically(string path, string text)
    {
        var temporary = path + ".partial";
        File.WriteAllText(temporary, text);
        File.Move(temporary, path, overwrite: true);
    }

    private static Command Show()
    {
        var dirArgument = new Argument<string>("DIR") { Description = "A campaign's results folder." };
        var jsonOption = new Option<bool>("--json") { Description = "Print summary.json's content instead of a table." };
        var command = new Command("show", "Print a campaign's summary (also of an interrupted one, from the runs stored so far).") { dirArgument, jsonOption };
        command.SetAction((parse, _) =>
        {
            using var store = OpenExisting(parse.GetValue(dirArgument)!);
            var summary = CampaignSummary.Build(store.Settings(), store.Runs());
            if (parse.GetValue(jsonOption)) Console.Out.Write(CampaignSummary.ToJson(summary));
            else Print(summary);
            return Task.FromResult((int)ExitCode.Ok);
        });
        return command;
    }

    private static Command Log()
    {
        var dirArgument = new Argument<string>("DIR") { Description = "A campaign's results folder." };
        var runOption = new Option<int>("--run") { Description = "The run's index (from 0).", Required = true };
        var variantOption = new Option<string>("--variant") { Description = "The variant (default: baseline).", DefaultValueFactory = _ => CampaignVariant.BaselineName };
        var outputOption = CommonOptions.Output("Where to write the log (default DIR/logs/<variant>-run<I>-seed<S>.jsonl).");
        var forceOption = CommonOptions.Force();
        var command = new Command("log", "Regenerate one run's event log, byte for byte as 'descentops run' writes it with that run's seed.") { dirArgument, runOption, variantOption, outputOption, forceOption };
        command.SetAction(async (parse, _) =>
        {
            var dir = parse.GetValue(dirArgument)!;
            using var store = OpenExisting(dir);
            var settings = store.Settings();
            if (settings["tool_version"] != ToolInfo.Version)
            {
                throw new UsageException($"the campaign was run by DescentOps {settings["tool_version"]}, this is {ToolInfo.Version}: its logs can only be regenerated byte for byte by the same build");
            }

            var plan = PlanOf(settings);
            var variant = parse.GetValue(variantOption)!;
            if (plan.Variants.All(v => v.Name != variant)) throw new UsageException($"--variant: the campaign has {string.Join(", ", plan.Variants.Select(v => v.Name))}");
            var index = parse.GetValue(runOption);
            if (index < 0) throw new UsageException("--run: an index from 0");
            var spec = plan.Spec(variant, index);
            var path = OutputPaths.Claim(parse.GetValue(outputOption) ?? LogPath(Path.Combine(dir, "logs"), spec), parse.GetValue(forceOption), Path.Combine(dir, Database));
            Directory.CreateDirectory(Path.GetDirectoryName(path)!);
            var manifest = plan.ManifestFor(variant, spec.Seed);
            using (var writer = JournalWriter.Create(path, manifest, replaceExisting: parse.GetValue(forceOption)))
            {
                await JournaledRun.RunAsync(plan.ScenarioOf(variant), manifest, writer, KernelChoice.Sequential).ConfigureAwait(false);
            }

            var expected = store.Runs().FirstOrDefault(r => r.Variant == variant && r.Index == index)?.SummaryChain;
            var chain = RunExecutor.LastChainOf(path);
            Console.Out.WriteLine(string.Create(CultureInfo.InvariantCulture, $"run {index} of {variant}, seed {spec.Seed}: {path}"));
            if (expected is null)
            {
                Console.Out.WriteLine("  (the campaign has not stored this run; nothing to compare with)");
                return (int)ExitCode.Ok;
            }

            Console.Out.WriteLine(chain == expected ? "  its summary chain value equals the campaign's record" : $"  its chain value {chain} differs from the campaign's record {expected}");
            return (int)(chain == expected ? ExitCode.Ok : ExitCode.RunsDiffer);
        });
        return command;
    }

    private static CampaignStore OpenExisting(string dir)
    {
        var path = Path.Combine(dir, Database);
        if (!File.Exists(path)) throw new FileNotFoundException($"no campaign in {dir} (no {Database})", path);
        return CampaignStore.Open(path);
    }

    private static void Print(JsonObject summary)
    {
        var c = CultureInfo.InvariantCulture;
        foreach (var v in summary["variants"]!.AsArray())
        {
            var ci = v!["success_ci95"]!.AsArray();
            var median = v["breakthrough_quantiles"]!.AsArray().First(q => q!["p"]!.GetValue<double>() == 0.5)!["t_s"];
            Console.Out.WriteLine(string.Create(c, $"  {v["name"]!.GetValue<string>(),-20} {v["successes"]}/{v["runs"]} succeeded ({(v["success_rate"]?.GetValue<double>() ?? 0):P1}, 95 % {ci[0]!.GetValue<double>():P1} to {ci[1]!.GetValue<double>():P1}); median breakthrough {(median is null ? "not reached" : $"{median.GetValue<double>() / 86400:F2} d")}"));
            foreach (var (criterion, passed) in v["criteria_passed"]!.AsObject()) Console.Out.WriteLine($"    criterion {criterion}: met in {passed} run(s)");
            var never = v["rules_never_fired"]!.AsArray();
            if (never.Count > 0) Console.Out.WriteLine($"    rules that never fired: {string.Join(", ", never.Select(n => n!.GetValue<string>()))}");
            if (v["procedure_branches"] is JsonArray { Count: > 0 } branches)
            {
                var untaken = branches.Where(b => b!["runs"]!.GetValue<int>() == 0).Select(b => $"{b!["procedure"]}/{b["step"]} {b["branch"]}").ToList();
                Console.Out.WriteLine($"    procedure branches taken in some run: {branches.Count - untaken.Count} of {branches.Count}{(untaken.Count == 0 ? "" : $"; never: {string.Join(", ", untaken)}")}");
            }

            if (v["landers"] is JsonArray landers)
            {
                foreach (var l in landers)
                {
                    var lci = l!["success_ci95"]!.AsArray();
                    Console.Out.WriteLine(string.Create(c, $"    lander {l["name"]!.GetValue<string>(),-12} {l["successes"]}/{l["runs"]} succeeded (95 % {lci[0]!.GetValue<double>():P1} to {lci[1]!.GetValue<double>():P1}); reached the ocean {l["reached_ocean"]}, stalled {l["stalled"]}, station dead {l["station_dead"]}"));
                }
            }
        }

        foreach (var p in summary["pairs"]!.AsArray())
        {
            var ci = p!["difference_ci95"]!.AsArray();
            Console.Out.WriteLine(string.Create(c, $"  {p["first"]} vs {p["second"]}: both {p["both"]}, first only {p["first_only"]}, second only {p["second_only"]}, neither {p["neither"]}; difference {p["difference"]!.GetValue<double>():+0.0%;-0.0%;0.0%} (95 % {ci[0]!.GetValue<double>():+0.0%;-0.0%;0.0%} to {ci[1]!.GetValue<double>():+0.0%;-0.0%;0.0%}); exact McNemar p = {p["mcnemar_p"]!.GetValue<double>():G3}; {p["disagreeing_runs"]!.AsArray().Count} disagreeing run(s)"));
        }
    }
}
