using System.CommandLine;
using System.Diagnostics;
using System.Globalization;
using DescentOps.Cli.Files;
using DescentOps.Cli.Output;
using DescentOps.Cli.Running;
using DescentOps.Cli.Terminal;
using DescentOps.Engine.Randomness;
using DescentOps.Engine.Running;
using DescentOps.Journal;
using DescentOps.Mission.Running;
using DescentOps.Scenarios.Format;
using DescentOps.Scenarios.Model;

namespace DescentOps.Cli.Commands;

/// <summary><c>descentops run [SCENARIO] [--seed N] [--until DURATION] [--log PATH]</c>: one mission, one log.</summary>
public static class RunCommand
{
    /// <summary>The option that lets a run write a log larger than <see cref="LogSizeEstimate.DefaultLimitBytes"/>.</summary>
    public const string NoLogLimitOption = "--no-log-limit";

    public static Command Create()
    {
        var scenarioArgument = new Argument<string?>("SCENARIO")
        {
            Description = "Scenario file, or the name of a built-in scenario; the built-in default when omitted.",
            Arity = ArgumentArity.ZeroOrOne,
        };
        // Without this, a mistyped option ("--sed") would be taken for a scenario file name.
        scenarioArgument.Validators.Add(result =>
        {
            if (result.GetValueOrDefault<string?>() is { } value && value.StartsWith('-'))
            {
                result.AddError($"Unknown option '{value}'.");
            }
        });
        var seedOption = new Option<long?>("--seed", "-s") { Description = "Seed of the run's random streams (default: the scenario's run.seed).", HelpName = "N" };
        var untilOption = new Option<string?>("--until", "-u") { Description = "Simulated time limit with a unit, e.g. '120 d' (default: the scenario's run.until).", HelpName = "DURATION" };
        var logOption = CommonOptions.Output("Where to write the event log (default: logs/<scenario>-seed<N>.jsonl, or -2, -3... if that is taken).");
        var forceOption = CommonOptions.Force();
        var jsonOption = CommonOptions.Json();
        var kernelOption = new Option<KernelChoice>("--kernel", "-k")
        {
            Description = "actors (default) or sequential: both write the same log; sequential is the reference.",
            DefaultValueFactory = _ => KernelChoice.Actors,
            HelpName = "actors|sequential",
        };

        var noLogLimitOption = new Option<bool>(NoLogLimitOption)
        {
            Description = "Run even when the log could grow past 2 GB by the time limit (estimated from the telemetry interval before the run starts).",
        };

        var command = new Command("run", "Run a scenario and write its event log.")
        {
            scenarioArgument, seedOption, untilOption, logOption, forceOption, jsonOption, kernelOption, noLogLimitOption,
        };
        command.SetAction((parse, cancel) => ExecuteAsync(
            parse.GetValue(scenarioArgument),
            parse.GetValue(seedOption),
            parse.GetValue(untilOption),
            parse.GetValue(logOption),
            parse.GetValue(kernelOption),
            parse.GetValue(forceOption),
            parse.GetValue(jsonOption),
            parse.GetValue(noLogLimitOption)));
        return command;
    }

    /// <summary>The manifest of a run: with the binary, all a rerun needs to reproduce the log byte for byte.</summary>
    public static RunManifest ManifestFor(Scenario scenario, long seed, double untilS) =>
        new(ToolInfo.Version, scenario.Name, scenario.SourceText, seed, untilS, RandomStream.AlgorithmName);

    private static async Task<int> ExecuteAsync(string? scenarioArgument, long? seedOverride, string? untilText, string? logPath, KernelChoice kernel, bool force, bool json, bool noLogLimit)
    {
        var scenario = ScenarioSource.Load(scenarioArgument);
        var seed = seedOverride ?? scenario.Run.Seed;
        var untilS = scenario.Run.UntilS;
        if (untilText is not null)
        {
            if (!QuantityParser.TryParseSi(QuantityKind.Duration, untilText, out untilS, out var error) || untilS <= 0)
            {
                throw new UsageException($"--until: {(error.Length > 0 ? error : "the time limit must be positive")}");
            }
        }

        RunPreflight.Check(scenario, untilS, untilText is null ? null : "--until", noLogLimit);
        // Every check comes before anything is created: a refused run leaves no folder and no file.
        var named = logPath is not null;
        var path = named
            ? OutputPaths.Claim(logPath!, force, ScenarioSource.FilePath(scenarioArgument))
            : OutputPaths.Fresh("logs", $"{scenario.Name}-seed{seed}", ".jsonl");
        var manifest = ManifestFor(scenario, seed, untilS);
        var info = json ? Console.Error : Console.Out;
        info.WriteLine(string.Create(CultureInfo.InvariantCulture, $"DescentOps {ToolInfo.Version}: scenario '{scenario.Name}' ({scenario.SourceName}), seed {seed}, until {untilS / 86400:0.###} d"));

        var directory = Path.GetDirectoryName(path)!;
        var createdDirectory = !Directory.Exists(directory);
        Directory.CreateDirectory(directory);
        var progress = new ProgressLine("  ");
        var mission = new MissionProgress(scenario.Shell.ThicknessM);
        using var interruption = Interruption.Watch();
        var wall = Stopwatch.StartNew();
        MissionSummary summary;
        var writer = JournalWriter.Create(path, manifest, replaceExisting: force);
        try
        {
            summary = await JournaledRun.RunAsync(scenario, manifest, writer, kernel, p =>
            {
                interruption.ThrowIfRequested();
                progress.Text(elapsed => mission.Describe(p, elapsed));
            }, mission).ConfigureAwait(false);
        }
        catch (OperationCanceledException) when (interruption.Requested)
        {
            writer.Dispose(); // hands over what is buffered: the partial log is an intact prefix
            progress.Done();
            Console.Error.WriteLine($"descentops: interrupted; the run stopped and its partial log is {writer.PartialPath} (an intact prefix: 'descentops verify' reports its cut tail).");
            return (int)ExitCode.Interrupted;
        }
        catch (FinalNameTakenException taken) when (!named)
        {
            // Another run took the fresh name while this one ran: take the next one rather than replace it.
            path = OutputPaths.Fresh(directory, $"{scenario.Name}-seed{seed}", ".jsonl");
            File.Move(taken.PartialPath, path, overwrite: false);
            summary = taken.Summary;
        }
        catch (FinalNameTakenException taken)
        {
            throw new OutputRefusedException(taken.Message);
        }
        catch
        {
            progress.Done();
            writer.Dispose();
            if (createdDirectory && Directory.Exists(directory) && !Directory.EnumerateFileSystemEntries(directory).Any()) Directory.Delete(directory);
            throw;
        }
        finally
        {
            progress.Done();
            writer.Dispose();
        }

        wall.Stop();
        if (json) WriteJson(scenario, seed, untilS, summary, wall.Elapsed, path);
        else PrintSummary(scenario, summary, wall.Elapsed, path);
        return (int)(summary.Outcome.Kind switch
        {
            RunOutcomeKind.Completed => ExitCode.Ok,
            RunOutcomeKind.ComponentFailed or RunOutcomeKind.KernelFault => ExitCode.RunAborted,
            _ => ExitCode.MissionNotCompleted,
        });
    }

    private static void WriteJson(Scenario scenario, long seed, double untilS, MissionSummary s, TimeSpan wall, string path) => JsonOutput.Write(w =>
    {
        w.WriteString("scenario", scenario.Name);
        w.WriteString("source", scenario.SourceName);
        w.WriteNumber("seed", seed);
        w.Number("until_s", untilS);
        w.WriteString("outcome", s.Outcome.Kind.ToString());
        w.WriteString("reason", s.Outcome.Reason);
        w.Number("simulated_time_s", s.FinalTimeS);
        w.Number("breakthrough_time_s", s.BreakthroughTimeS);
        w.Number("final_depth_m", s.FinalDepthM);
        w.Number("shell_thickness_m", scenario.Shell.ThicknessM);
        w.Number("energy_used_j", s.EnergyUsedJ);
        w.WriteNumber("faults_injected", s.FaultsInjected);
        w.WriteNumber("frames_sent", s.FramesSent);
        w.WriteNumber("frames_received_on_ground", s.FramesReceivedOnGround);
        w.WriteNumber("frames_lost", s.FramesLost);
        w.WriteNumber("vehicle_profiles", s.VehicleProfiles);
        w.WriteNumber("component_failures", s.ComponentFailures);
        w.WriteNumber("events_delivered", s.EventsDelivered);
        w.WriteNumber("records_written", s.RecordsWritten);
        w.Number("wall_time_s", wall.TotalSeconds);
        w.WriteString("log", path);
        w.WriteStartArray("faults");
        foreach (var f in s.Faults)
        {
            w.WriteStartObject();
            w.WriteString("fault", f.Fault);
            w.WriteString("kind", f.Kind);
            w.Number("start_s", f.StartS);
            w.Number("detected_after_s", f.DetectedAfterS);
            w.Number("first_action_after_s", f.FirstActionAfterS);
            w.Number("recovered_after_s", f.RecoveredAfterS);
            w.WriteString("recovery", f.Recovery.ToString());
            w.WriteEndObject();
        }

        w.WriteEndArray();
    });

    private static void PrintSummary(Scenario scenario, MissionSummary s, TimeSpan wall, string path)
    {
        var c = CultureInfo.InvariantCulture;
        var rows = new (string, string)[]
        {
            ("outcome", $"{s.Outcome.Kind}: {s.Outcome.Reason}"),
            ("simulated time", Days(s.FinalTimeS)),
            ("time to breakthrough", s.BreakthroughTimeS is { } b ? Days(b) : "not reached"),
            ("final depth", string.Create(c, $"{s.FinalDepthM:F1} m of {scenario.Shell.ThicknessM:F0} m")),
            ("energy used", string.Create(c, $"{s.EnergyUsedJ / 3.6e9:F2} MWh ({s.EnergyUsedJ:F0} J)")),
            ("faults injected", s.FaultsInjected.ToString(c)),
            ("telemetry frames", string.Create(c, $"{s.FramesSent} sent = {s.FramesReceivedOnGround} received on ground + {s.FramesLost} lost + {s.FramesHeldOrInFlight} held or in flight at the end")),
            ("time stopped", string.Create(c, $"{Hours(s.TimeStoppedS)} (longest {Hours(s.LongestStopS)}, frozen in {Hours(s.TimeFrozenS)})")),
            ("time blind", Hours(s.TimeBlindS) + " (the ground saw nothing of the probe)"),
            ("most frames held", s.FramesHeldMax.ToString(c)),
            ("vehicles lost", s.VehiclesLost.ToString(c)),
            ("vehicle profiles", s.VehicleProfiles.ToString(c)),
            ("component failures", s.ComponentFailures.ToString(c)),
            ("events", string.Create(c, $"{s.EventsDelivered} delivered, {s.RecordsWritten} logged")),
            ("wall time", string.Create(c, $"{wall.TotalSeconds:F2} s")),
            ("speed-up", string.Create(c, $"{s.FinalTimeS / Math.Max(wall.TotalSeconds, 1e-6):F0} x real time")),
            ("event log", path),
        };
        foreach (var (label, value) in rows) Console.Out.WriteLine($"  {label,-22}{value}");
        foreach (var criterion in s.Criteria)
        {
            Console.Out.WriteLine(string.Create(c, $"  criterion {criterion.Name,-13}{(criterion.Passed ? "met" : "NOT met")}: {criterion.Requirement} (measured {(criterion.Value is { } v ? v.ToString("G6", c) : "none")})"));
        }

        if (s.Criteria.Count > 0) Console.Out.WriteLine($"  {"success",-22}{(s.Success ? "yes" : "no")}");
        foreach (var f in s.Faults)
        {
            Console.Out.WriteLine(string.Create(c, $"  fault {f.Fault} ({f.Kind}, at {f.StartS / 86400:F3} d): detected {After(f.DetectedAfterS)}, first action {After(f.FirstActionAfterS)}, recovered {After(f.RecoveredAfterS)} [{f.Recovery}]"));
        }
    }

    private static string After(double? seconds) =>
        seconds is { } s ? string.Create(CultureInfo.InvariantCulture, $"after {s / 3600:F2} h") : "never";

    private static string Hours(double seconds) =>
        string.Create(CultureInfo.InvariantCulture, $"{seconds / 3600:F2} h");

    private static string Days(double seconds) =>
        string.Create(CultureInfo.InvariantCulture, $"{seconds / 86400:F3} d ({seconds:F0} s)");
}
