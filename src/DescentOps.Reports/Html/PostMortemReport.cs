using System.Text;
using DescentOps.Reports.Plotting;

namespace DescentOps.Reports.Html;

/// <summary>Makes the HTML post-mortem of one log and writes it in one piece (temporary name, then rename).</summary>
public static class PostMortemReport
{
    /// <summary>Writes the report; returns the plots as drawn or skipped.</summary>
    /// <param name="log">The log, as far as it is intact.</param>
    /// <param name="outputPath">The HTML file to write.</param>
    /// <param name="generator">Names the tool and version on the page.</param>
    /// <param name="plots">The plots to draw; <see cref="ReportPlots.Default"/> when null.</param>
    public static IReadOnlyList<RenderedPlot> Write(RunLog log, string outputPath, string generator, IReadOnlyList<PlotDefinition>? plots = null)
    {
        ArgumentNullException.ThrowIfNull(log);
        var timeline = FaultTimeline.Of(log);
        var rendered = (plots ?? ReportPlots.For(log)).Select(p => SvgPlotRenderer.Render(log, p, timeline)).ToList();
        AtomicFile.Write(outputPath, partial =>
        {
            using var stream = new FileStream(partial, FileMode.CreateNew, FileAccess.Write, FileShare.None, 1 << 16);
            using var text = new StreamWriter(stream, new UTF8Encoding(encoderShouldEmitUTF8Identifier: false));
            new HtmlReportWriter(text).Write(log, rendered, generator);
        });
        return rendered;
    }

    /// <summary>The default report path: the log's path with <c>.html</c> in place of its extension.</summary>
    public static string DefaultPath(string logPath) => Path.ChangeExtension(logPath, ".html");
}
