using System.CommandLine;
using DescentOps.Cli.Files;
using DescentOps.Cli.Running;
using DescentOps.Cli.Terminal;
using DescentOps.Reports;
using DescentOps.Reports.Html;
using DescentOps.Reports.Plotting;

namespace DescentOps.Cli.Commands;

/// <summary><c>descentops report LOG [--output PATH]</c>: writes a self-contained HTML post-mortem of a run.</summary>
public static class ReportCommand
{
    public static Command Create()
    {
        var logArgument = CommonOptions.Log("The event log to report on.");
        var outputOption = CommonOptions.Output("The HTML file to write (default: LOG with .html).");
        var forceOption = CommonOptions.Force();
        var command = new Command("report", "Write a self-contained HTML post-mortem of a run: outcome, plots, notable events, cautions.") { logArgument, outputOption, forceOption };
        command.SetAction(parse =>
        {
            var path = parse.GetValue(logArgument)!;
            string reportPath;
            // The chain is checked first: a post-mortem of an edited log would lend its numbers a credibility they lack.
            // The log is read twice (verify, then gather), about equally fast; drawing the page is quick beside them.
            var progress = new ProgressLine("  report ");
            IReadOnlyList<RenderedPlot> plots;
            try
            {
                LogGate.Open(path, share => progress.Fraction(0.45 * share, "verifying the log"));
                var output = OutputPaths.Claim(parse.GetValue(outputOption) ?? PostMortemReport.DefaultPath(path), parse.GetValue(forceOption), path);
                var log = RunLog.Load(path, share => progress.Fraction(0.45 + 0.5 * share, "reading the log"));
                progress.Fraction(0.95, "drawing the plots");
                plots = PostMortemReport.Write(log, output, $"DescentOps {ToolInfo.Version}");
                reportPath = output;
            }
            finally
            {
                progress.Done();
            }

            foreach (var skipped in plots.Where(p => p.Skipped)) Console.Error.WriteLine($"note: plot '{skipped.Definition.Id}' skipped: {skipped.Note}");
            Console.Out.WriteLine($"report: {Path.GetFullPath(reportPath)} ({plots.Count(p => !p.Skipped)} plots)");
            return (int)ExitCode.Ok;
        });
        return command;
    }
}
