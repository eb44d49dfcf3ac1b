using System.CommandLine;
using System.Globalization;
using System.Security.Cryptography;
using DescentOps.Cli.Running;
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
        var logArgument = new Argument<string>("LOG") { Description = "The parent run's event log." };
        var atOption = new Option<string>("--at") { Description = "The branch instant, simulated time with a unit (e.g. '40 d').", Required = true };
        var withOption = new Option<string>("--with") { Description = "Change file (YAML: add_faults, remove_faults, rules).", Required = true };
        var outOption = new Option<string?>("--log") { Description = "Where to write the branch log (default: beside the parent, '-branch' added)." };
        var command = new Command("branch", "Continue a logged run from an instant with a change; the new log records its parent.")
        {
            logArgument, atOption, withOption, outOption,
        };
        command.SetAction((parse, _) => ExecuteAsync(parse.GetValue(logArgument)!, parse.GetValue(atOption)!, parse.GetValue(withOption)!, parse.GetValue(outOption)));
        return command;
    }

    private static async Task<int> ExecuteAsync(string parentPath, string atText, string changePath, string? output)
    {
        if (!QuantityParser.TryParseSi(QuantityKind.Duration, atText, out var atS, out var error)) throw new UsageException($"--at: {error}");
        var parent = LoggedRun.Open(parentPath);
        if (!File.Exists(changePath)) throw new FileNotFoundException($"no such change file: {changePath}", changePath);
        var changeText = await File.ReadAllTextAsync(changePath).ConfigureAwait(false);
        var change = ScenarioLoader.LoadChange(changeText, changePath);
        var scenario = change.ApplyTo(parent.Scenario);

        var parentSha = Convert.ToHexStringLower(SHA256.HashData(await File.ReadAllBytesAsync(parentPath).ConfigureAwait(false)));
        var branch = new BranchInfo(BranchInfo.All(parent.Manifest).Count + 1, parentSha, atS, Path.GetFileName(changePath), changeText);
        var manifest = parent.Manifest with { Extra = [.. parent.Manifest.Extra, .. branch.ToFields()] };
        var path = Path.GetFullPath(output ?? Path.Combine(Path.GetDirectoryName(Path.GetFullPath(parentPath))!, Path.GetFileNameWithoutExtension(parentPath) + "-branch.jsonl"));
        if (File.Exists(path))
        {
            throw new UsageException($"--log: {path} exists; a branch never replaces a log (the parent least of all). Name a new file.");
        }

        // Written and checked under a temporary name: an unchecked branch must never sit under its final name.
        var checking = path + ".unchecked";
        MissionSummary summary;
        try
        {
            using (var file = new FileStream(checking, FileMode.Create, FileAccess.Write, FileShare.Read))
            using (var writer = JournalWriter.Create(file, manifest))
            {
                summary = await JournaledRun.RunAsync(scenario, manifest, writer, additions: Rehearsal.RehearsalLog.ForReplay(parent.Manifest, scenario, parentPath)).ConfigureAwait(false);
            }

            var diff = JournalDiff.Compare(parentPath, checking);
            var c = CultureInfo.InvariantCulture;
            if (diff.FirstEventDivergence is { } d && (d.TimeA ?? d.TimeB ?? 0) < atS)
            {
                Console.Error.WriteLine(string.Create(c, $"descentops: the change acts before the branch instant: the runs part at line {d.Line}, t = {(d.TimeA ?? d.TimeB):R} s, before {atS:R} s. No branch log was kept."));
                Console.Error.WriteLine($"  parent: {d.LineA}");
                Console.Error.WriteLine($"  branch: {d.LineB}");
                return (int)ExitCode.InvalidInput;
            }

            File.Move(checking, path);
            Report(parentPath, changePath, atS, summary, diff, path);
            return (int)ExitCode.Ok;
        }
        finally
        {
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
