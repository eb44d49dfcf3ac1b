using System.CommandLine;
using DescentOps.Reports;
using DescentOps.Reports.Html;

namespace DescentOps.Cli.Commands;

/// <summary><c>descentops report LOG [--output PATH]</c>: writes a self-contained HTML post-mortem of a run.</summary>
public static class ReportCommand
{
    public static Command Create()
    {
        var logArgument = new Argument<string>("LOG") { Description = "The event log to report on." };
        var outputOption = new Option<string?>("--output") { Description = "The HTML file to write (default: LOG with .html)." };
        var command = new Command("report", "Write a self-contained HTML post-mortem of a run: outcome, plots, notable events, cautions.") { logArgument, outputOption };
        command.SetAction(parse =>
        {
            var path = parse.GetValue(logArgument)!;
            if (!File.Exists(path)) throw new FileNotFoundException($"no such log: {path}", path);
            // The chain is checked first: a post-mortem of an edited log would lend its numbers a credibility they lack.
            var integrity = LogIntegrity.Check(path);
            if (integrity.State == LogState.Damaged) throw new LogIntegrityException($"{path}:{integrity.Line}: refused: {integrity.Detail}");
            if (integrity.State == LogState.Truncated) Console.Error.WriteLine($"note: {path}: {integrity.TruncationNote}");

            var output = parse.GetValue(outputOption) ?? PostMortemReport.DefaultPath(path);
            var plots = PostMortemReport.Write(RunLog.Load(path), output, $"DescentOps {ToolInfo.Version}");
            foreach (var skipped in plots.Where(p => p.Skipped)) Console.Error.WriteLine($"note: plot '{skipped.Definition.Id}' skipped: {skipped.Note}");
            Console.Out.WriteLine($"report: {Path.GetFullPath(output)} ({plots.Count(p => !p.Skipped)} plots)");
            return (int)ExitCode.Ok;
        });
        return command;
    }
}
