using System.CommandLine;
using System.Globalization;
using DescentOps.Cli.Output;
using DescentOps.Cli.Running;
using DescentOps.Cli.Terminal;
using DescentOps.Journal.Comparison;
using DescentOps.Mission.Running;

namespace DescentOps.Cli.Commands;

/// <summary><c>descentops replay LOG</c>: re-runs a logged run from its manifest and compares it line by line.</summary>
public static class ReplayCommand
{
    private const int ShownChars = 160;

    public static Command Create()
    {
        var logArgument = CommonOptions.Log("The event log to re-run and compare.");
        var kernelOption = CommonOptions.Kernel("actors (default) or sequential.");
        var jsonOption = CommonOptions.Json();
        var command = new Command("replay", "Re-run a logged run from its manifest (scenario, seed, limit) and compare the new log with it line by line.")
        {
            logArgument, kernelOption, jsonOption,
        };
        command.SetAction((parse, _) => ExecuteAsync(parse.GetValue(logArgument)!, parse.GetValue(kernelOption), parse.GetValue(jsonOption)));
        return command;
    }

    private static async Task<int> ExecuteAsync(string path, KernelChoice kernel, bool json)
    {
        var logged = LoggedRun.Open(path);
        var manifest = logged.Manifest;
        var notes = json ? Console.Error : Console.Out;
        var otherTool = manifest.ToolVersion != ToolInfo.Version;
        if (otherTool)
        {
            notes.WriteLine($"note: the log was written by DescentOps {manifest.ToolVersion}; this is {ToolInfo.Version}. Differences may come from the tool, not the run.");
        }

        if (logged.IsTruncated)
        {
            notes.WriteLine($"note: the log is truncated at line {logged.Integrity.FirstBadLine}; comparing its {logged.IntactLines} intact lines.");
        }

        var progress = new ProgressLine("  replay ");
        using var interruption = Interruption.Watch();
        JournalDivergence? found;
        long linesMatched;
        try
        {
            (found, linesMatched) = await LogReplay.CompareAsync(logged, kernel, share =>
            {
                interruption.ThrowIfRequested();
                progress.Fraction(share, "of the log re-run and matched");
            }).ConfigureAwait(false);
        }
        catch (OperationCanceledException) when (interruption.Requested)
        {
            progress.Done();
            Console.Error.WriteLine("descentops: interrupted; the replay stopped before the end of the log (nothing was written).");
            return (int)ExitCode.Interrupted;
        }
        finally
        {
            progress.Done();
        }

        if (json)
        {
            JsonOutput.Write(w =>
            {
                w.WriteString("log", path);
                w.WriteBoolean("identical", found is null);
                w.WriteNumber("lines_matched", linesMatched);
                w.Number("truncated_at_line", logged.IsTruncated ? logged.Integrity.FirstBadLine : null);
                w.WriteString("log_tool_version", manifest.ToolVersion);
                w.WriteString("tool_version", ToolInfo.Version);
                w.Divergence("divergence", found);
            });
            return (int)(found is null ? ExitCode.Ok : ExitCode.RunsDiffer);
        }

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
