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
        var kernelOption = CommonOptions.Kernel("actors (default) or sequential: both write the same log; sequential is the reference.");

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
        if (json) RunSummaryOutput.WriteJson(Console.Out, scenario, seed, untilS, summary, wall.Elapsed, path);
        else RunSummaryOutput.WriteText(Console.Out, scenario, summary, wall.Elapsed, path);
        return (int)(summary.Outcome.Kind switch
        {
            RunOutcomeKind.Completed => ExitCode.Ok,
            RunOutcomeKind.ComponentFailed or RunOutcomeKind.KernelFault => ExitCode.RunAborted,
            _ => ExitCode.MissionNotCompleted,
        });
    }
}
