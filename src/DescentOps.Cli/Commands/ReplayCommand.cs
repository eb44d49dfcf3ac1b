using System.CommandLine;
using System.Globalization;
using DescentOps.Cli.Running;
using DescentOps.Mission.Running;

namespace DescentOps.Cli.Commands;

/// <summary><c>descentops replay LOG</c>: re-runs a logged run from its manifest and compares it line by line.</summary>
public static class ReplayCommand
{
    private const int ShownChars = 160;

    public static Command Create()
    {
        var logArgument = new Argument<string>("LOG") { Description = "The event log to re-run and compare." };
        var kernelOption = new Option<KernelChoice>("--kernel") { Description = "actors (default) or sequential.", DefaultValueFactory = _ => KernelChoice.Actors };
        var command = new Command("replay", "Re-run a logged run from its manifest (scenario, seed, limit) and compare the new log with it line by line.")
        {
            logArgument, kernelOption,
        };
        command.SetAction((parse, _) => ExecuteAsync(parse.GetValue(logArgument)!, parse.GetValue(kernelOption)));
        return command;
    }

    private static async Task<int> ExecuteAsync(string path, KernelChoice kernel)
    {
        var logged = LoggedRun.Open(path);
        var manifest = logged.Manifest;
        if (manifest.ToolVersion != ToolInfo.Version)
        {
            Console.Out.WriteLine($"note: the log was written by DescentOps {manifest.ToolVersion}; this is {ToolInfo.Version}. Differences may come from the tool, not the run.");
        }

        if (logged.IsTruncated)
        {
            Console.Out.WriteLine($"note: the log is truncated at line {logged.Integrity.FirstBadLine}; comparing its {logged.IntactLines} intact lines.");
        }

        var (found, linesMatched) = await LogReplay.CompareAsync(logged, kernel).ConfigureAwait(false);
        if (found is not { } divergence)
        {
            Console.Out.WriteLine($"{path}: identical ({linesMatched} lines re-run and matched)");
            return (int)ExitCode.Ok;
        }

        Console.Out.WriteLine($"{path}: diverges at line {divergence.Line} (simulated time {Time(divergence.TimeA)} in the log, {Time(divergence.TimeB)} in the re-run)");
        Console.Out.WriteLine($"  log:    {Shorten(divergence.LineA)}");
        Console.Out.WriteLine($"  re-run: {Shorten(divergence.LineB)}");
        return (int)ExitCode.RunsDiffer;
    }

    private static string Time(double? seconds) =>
        seconds is { } s ? string.Create(CultureInfo.InvariantCulture, $"{s:R} s") : "none";

    private static string Shorten(string? line) =>
        line is null ? "(no line: this side ended)" : line.Length <= ShownChars ? line : line[..ShownChars] + "…";
}
