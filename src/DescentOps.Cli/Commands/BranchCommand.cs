using System.CommandLine;
using System.Globalization;
using System.Security.Cryptography;
using DescentOps.Cli.Files;
using DescentOps.Cli.Running;
using DescentOps.Cli.Terminal;
using DescentOps.Journal;
using DescentOps.Journal.Comparison;
using DescentOps.Mission.Running;
using DescentOps.Scenarios.Format;
using DescentOps.Scenarios.Loading;

namespace DescentOps.Cli.Commands;

/// <summary>
/// <c>descentops branch LOG --at TIME --with CHANGE</c>: re-runs a logged run with a change (faults added or
/// removed, the rules replaced) and proves that everything before the instant is identical to the parent: a change
/// that would act earlier is refused and its log discarded, not silently accepted.
/// </summary>
public static class BranchCommand
{
    public static Command Create()
    {
        var logArgument = CommonOptions.Log("The parent run's event log.");
        var atOption = new Option<string>("--at", "-a") { Description = "The branch instant, simulated time with a unit (e.g. '40 d').", Required = true, HelpName = "TIME" };
        var withOption = new Option<string>("--with", "-w") { Description = "Change file (YAML: add_faults, remove_faults, rules).", Required = true, HelpName = "CHANGE" };
        var outOption = CommonOptions.Output("Where to write the branch log (default: beside the parent, '-branch' added, or -branch-2, -branch-3... if taken).");
        var forceOption = CommonOptions.Force();
        var command = new Command("branch", "Continue a logged run from an instant with a change; the new log records its parent.")
        {
            logArgument, atOption, withOption, outOption, forceOption,
        };
        command.SetAction((parse, _) => ExecuteAsync(parse.GetValue(logArgument)!, parse.GetValue(atOption)!, parse.GetValue(withOption)!, parse.GetValue(outOption), parse.GetValue(forceOption)));
        return command;
    }

    private static async Task<int> ExecuteAsync(string parentPath, string atText, string changePath, string? output, bool force)
    {
        if (!QuantityParser.TryParseSi(QuantityKind.Duration, atText, out var atS, out var error)) throw new UsageException($"--at: {error}");
        var parent = LoggedRun.Open(parentPath);
        if (!File.Exists(changePath)) throw new FileNotFoundException($"no such change file: {changePath}", changePath);
        var changeText = await File.ReadAllTextAsync(changePath).ConfigureAwait(false);
        var change = ScenarioLoader.LoadChange(changeText, changePath);
        if (change.EarliestTimedActionS is { } earliest && earliest < atS)
        {
            throw new UsageException(string.Create(CultureInfo.InvariantCulture, $"{changePath}: a telecommand or rule uplink at {earliest:R} s is before the branch instant {atS:R} s; a branch changes nothing before its instant"));
        }

        var scenario = change.ApplyTo(parent.Scenario);

        var parentSha = Convert.ToHexStringLower(SHA256.HashData(await File.ReadAllBytesAsync(parentPath).ConfigureAwait(false)));
        var branch = new BranchInfo(BranchInfo.All(parent.Manifest).Count + 1, parentSha, atS, Path.GetFileName(changePath), changeText);
        var manifest = parent.Manifest with { Extra = [.. parent.Manifest.Extra, .. branch.ToFields()] };
        var path = output is not null
            ? OutputPaths.Claim(output, force, parentPath, changePath)
            : OutputPaths.Fresh(Path.GetDirectoryName(Path.GetFullPath(parentPath))!, Path.GetFileNameWithoutExtension(parentPath) + "-branch", ".jsonl");

        // Written and checked under a temporary name of its own, created exclusively: an unchecked branch must never
        // sit under its final name, and two branches to one path never share a file.
        var checking = $"{path}.{Convert.ToHexStringLower(RandomNumberGenerator.GetBytes(4))}.unchecked";
        MissionSummary summary;
        var progress = new ProgressLine("  branch ");
        using var interruption = Interruption.Watch();
        try
        {
            using (var file = new FileStream(checking, FileMode.CreateNew, FileAccess.Write, FileShare.Read))
            using (var writer = JournalWriter.Create(file, manifest))
            {
                var untilS = Math.Max(manifest.UntilSeconds, 1e-9);
                summary = await JournaledRun.RunAsync(scenario, manifest, writer, progress: p =>
                {
                    interruption.ThrowIfRequested();
                    progress.Fraction(p.Now.SinceEpoch.TotalSeconds / untilS, string.Create(CultureInfo.InvariantCulture, $"day {p.Now.SinceEpoch.TotalDays:F1} of at most {untilS / 86400:F0}"));
                }, additions: Rehearsal.RehearsalLog.ForReplay(parent.Manifest, scenario, parentPath)).ConfigureAwait(false);
                file.Flush(flushToDisk: true);
            }

            progress.Done();
            var diff = JournalDiff.Compare(parentPath, checking);
            var c = CultureInfo.InvariantCulture;
            if (diff.FirstEventDivergence is { } d && (d.TimeA ?? d.TimeB ?? 0) < atS)
            {
                Console.Error.WriteLine(string.Create(c, $"descentops: the change acts before the branch instant: the runs part at line {d.Line}, t = {(d.TimeA ?? d.TimeB):R} s, before {atS:R} s. No branch log was kept."));
                Console.Error.WriteLine($"  parent: {d.LineA}");
                Console.Error.WriteLine($"  branch: {d.LineB}");
                return (int)ExitCode.InvalidInput;
            }

            File.Move(checking, path, overwrite: force);
            Report(parentPath, changePath, atS, summary, diff, path);
            return (int)ExitCode.Ok;
        }
        catch (OperationCanceledException) when (interruption.Requested)
        {
            progress.Done();
            Console.Error.WriteLine("descentops: interrupted; the branch stopped and no branch log was kept (an unchecked branch is never kept).");
            return (int)ExitCode.Interrupted;
        }
        finally
        {
            progress.Done();
            File.Delete(checking);
        }
    }

    private static void Report(string parentPath, string changePath, double atS, MissionSummary summary, JournalDiff diff, string path)
    {
        var c = CultureInfo.InvariantCulture;
        Console.Out.WriteLine(string.Create(c, $"branch of {parentPath} at {atS / 86400:0.###} d with {changePath}: {summary.Outcome.Kind}: {summary.Outcome.Reason}"));
        Console.Out.WriteLine(diff.FirstEventDivergence is { } first
            ? string.Create(c, $"  identical to the parent up to t = {(first.TimeA ?? first.TimeB):R} s ({(first.TimeA ?? first.TimeB) / 86400:F4} d), line {first.Line}")
            : "  identical to the parent event for event (the change did not act)");
        Console.Out.WriteLine($"  event log {path}");
    }
}
