using System.Globalization;
using DescentOps.Records;
using DescentOps.Journal;
using DescentOps.Reports.Plotting;
using DescentOps.Records.Kinds;

namespace DescentOps.Reports.Html;

/// <summary>
/// Writes the post-mortem page: outcome and key figures first (what a reader wants in the first ten seconds),
/// then the plots, the notable events, the run's inputs and the cautions. The markup is XHTML-compatible so
/// that it parses as XML as well as HTML, and it loads nothing: styles are inline, plots are inline SVG, and
/// the content security policy forbids any fetch, so the file reads the same offline and years later.
/// </summary>
public sealed class HtmlReportWriter
{
    /// <summary>More rows than this is a log to filter with <c>descentops events</c>, not to read in a page.</summary>
    public const int MaxEventRows = 500;

    private readonly TextWriter _out;

    public HtmlReportWriter(TextWriter output)
    {
        ArgumentNullException.ThrowIfNull(output);
        _out = output;
    }

    public void Write(RunLog log, IReadOnlyList<RenderedPlot> plots, string generator)
    {
        ArgumentNullException.ThrowIfNull(log);
        ArgumentNullException.ThrowIfNull(plots);
        var manifest = log.Manifest;
        Line("<!DOCTYPE html>");
        Line("<html xmlns=\"http://www.w3.org/1999/xhtml\" lang=\"en\">");
        Line("<head>");
        Line("<meta charset=\"utf-8\" />");
        Line("<meta http-equiv=\"Content-Security-Policy\" content=\"default-src 'none'; style-src 'unsafe-inline'\" />");
        Line("<meta name=\"viewport\" content=\"width=device-width, initial-scale=1\" />");
        Line($"<title>Post-mortem: {E(manifest.ScenarioName)}, seed {manifest.Seed.ToString(CultureInfo.InvariantCulture)}</title>");
        Line($"<style>{ReportStyle.Css}</style>");
        Line("</head>");
        Line("<body>");
        Line("<header>");
        Line($"<h1>Post-mortem: {E(manifest.ScenarioName)}</h1>");
        Line($"<p class=\"run\">seed {manifest.Seed.ToString(CultureInfo.InvariantCulture)} · log {E(Path.GetFileName(log.Path))} · written by {E(manifest.ToolVersion)}</p>");
        Line("</header>");

        if (log.IsTruncated) Truncation(log);
        Outcome(log);
        Plots(plots);
        NotableEvents(log);
        Inputs(log);
        CautionsSection();

        Line($"<footer><p>Made by {E(generator)} from {E(Path.GetFileName(log.Path))}; figures come from the log alone.</p></footer>");
        Line("</body>");
        Line("</html>");
    }

    private void Truncation(RunLog log)
    {
        Line("<section class=\"truncated\" id=\"truncation\">");
        Line("<h2>Truncated log</h2>");
        Line($"<p><strong>This log is truncated at line {N(log.TruncatedAtLine ?? 0)}.</strong> The run's summary line is missing, so its outcome is unknown. Everything below comes from the {N(log.Events.Count)} events before that line, which are intact (the hash chain holds up to there).</p>");
        Line("</section>");
    }

    private void Outcome(RunLog log)
    {
        Line("<section id=\"outcome\">");
        Line("<h2>Outcome</h2>");
        var figures = new List<SummaryFigure>();
        if (log.Summary is { } s)
        {
            var css = s.Summary.OutcomeKind == "Completed" ? "completed" : "not-completed";
            Line($"<p class=\"verdict {css}\" id=\"verdict\">{E(s.Summary.OutcomeKind)}: {E(s.Summary.Reason)}</p>");
            figures.Add(new SummaryFigure("simulated time", FigureFormatter.Duration(s.Summary.FinalTimeS)));
            figures.AddRange(s.Summary.Data.Select(FigureFormatter.Format));
        }
        else
        {
            Line("<p class=\"verdict unknown\" id=\"verdict\">Outcome unknown: the log ends before its summary.</p>");
            Line("<p class=\"note\">Figures as far as the log goes:</p>");
            figures.AddRange(AsFarAsItGoes(log));
        }

        Line("<table class=\"figures\">");
        foreach (var f in figures) Line($"<tr><th scope=\"row\">{E(f.Label)}</th><td>{E(f.Value)}</td></tr>");
        Line("</table>");
        Line("</section>");
    }

    /// <summary>For a log without its summary: the last values the log holds, each labelled as such.</summary>
    private static IEnumerable<SummaryFigure> AsFarAsItGoes(RunLog log)
    {
        yield return new SummaryFigure("events read", N(log.Events.Count));
        if (log.Events.Count > 0) yield return new SummaryFigure("last event at", FigureFormatter.Duration(log.Events[^1].TimeSeconds));
        var lastTelemetry = log.Events.LastOrDefault(e => e.Kind == ProbeRecords.Telemetry);
        if (lastTelemetry is null) yield break;
        foreach (var name in new[] { "depth_m", "energy_used_j" })
        {
            var field = lastTelemetry.Data.FirstOrDefault(f => f.Name == name);
            if (field.Name is not null) yield return new SummaryFigure($"last reported {FigureFormatter.Label(name)}", FigureFormatter.Value(field));
        }

        var breakthrough = log.Events.FirstOrDefault(e => e.Kind == ProbeRecords.Breakthrough);
        yield return new SummaryFigure("breakthrough", breakthrough is null ? "not in the log" : FigureFormatter.Duration(breakthrough.TimeSeconds));
    }

    private void Plots(IReadOnlyList<RenderedPlot> plots)
    {
        Line("<section id=\"plots\">");
        Line("<h2>Plots</h2>");
        Line("<p class=\"note\">Time runs in days of simulated mission time. Shaded bands on the depth plot are active faults; dashed lines are changes of the probe's regime, labelled with the new regime.</p>");
        foreach (var plot in plots)
        {
            var id = E("plot-" + plot.Definition.Id);
            if (plot.Skipped)
            {
                Line($"<p class=\"skipped\" id=\"{id}\">{E(plot.Definition.Title)}: {E(plot.Note)}</p>");
                continue;
            }

            Line($"<figure id=\"{id}\">");
            Line(plot.Svg!);
            Line($"<figcaption>{E(plot.Definition.Title)}{(plot.Note is null ? "" : ". " + E(plot.Note))}</figcaption>");
            Line("</figure>");
        }

        Line("</section>");
    }

    private void NotableEvents(RunLog log)
    {
        var notable = log.Events.Where(e => e.Severity >= Severity.Notice).ToList();
        Line("<section id=\"events\">");
        Line("<h2>Notable events</h2>");
        Line($"<p class=\"note\">{N(notable.Count)} events of severity notice or above.</p>");
        if (notable.Count > 0)
        {
            Line("<table id=\"notable\">");
            Line("<thead><tr><th>time (d)</th><th>t (s)</th><th>source</th><th>kind</th><th>severity</th><th>data</th></tr></thead>");
            Line("<tbody>");
            foreach (var e in notable.Take(MaxEventRows))
            {
                var severity = e.Severity.ToString().ToLowerInvariant();
                Line($"<tr class=\"sev-{severity}\"><td class=\"num\">{F(e.TimeSeconds / 86_400, "F3")}</td><td class=\"num\">{F(e.TimeSeconds, "F0")}</td><td>{E(e.Source)}</td><td>{E(e.Kind)}</td><td class=\"sev\">{severity}</td><td class=\"data\">{E(Data(e.Data))}</td></tr>");
            }

            Line("</tbody>");
            Line("</table>");
            if (notable.Count > MaxEventRows)
            {
                Line($"<p class=\"note\">{N(notable.Count - MaxEventRows)} more not shown; list them with <code>descentops events LOG --severity notice</code>.</p>");
            }
        }

        Line("</section>");
    }

    private void Inputs(RunLog log)
    {
        var m = log.Manifest;
        Line("<section id=\"inputs\">");
        Line("<h2>Run inputs</h2>");
        Line("<dl>");
        Pair("scenario", m.ScenarioName);
        Pair("scenario SHA-256", m.ScenarioSha256);
        Pair("seed", m.Seed.ToString(CultureInfo.InvariantCulture));
        Pair("time limit", FigureFormatter.Duration(m.UntilSeconds));
        Pair("random generator", m.RandomAlgorithm);
        Pair("tool version", m.ToolVersion);
        Pair("first chain value", log.ManifestChain);
        Line("</dl>");
        Line("<details><summary>Scenario text</summary>");
        Line($"<pre>{E(m.ScenarioText)}</pre>");
        Line("</details>");
        Line("</section>");
    }

    private void CautionsSection()
    {
        Line("<section id=\"cautions\">");
        Line("<h2>Cautions</h2>");
        foreach (var paragraph in Cautions.Paragraphs) Line($"<p>{E(paragraph)}</p>");
        Line("</section>");
    }

    private void Pair(string term, string value) => Line($"<dt>{E(term)}</dt><dd>{E(value)}</dd>");

    private void Line(string text) => _out.Write(text + "\n");

    private static string Data(IReadOnlyList<RecordField> data) =>
        string.Join(", ", data.Select(f => f.Kind == RecordFieldKind.Number
            ? $"{f.Name}={f.Number.ToString("G6", CultureInfo.InvariantCulture)}"
            : f.Kind == RecordFieldKind.Boolean ? $"{f.Name}={(f.Integer != 0 ? "true" : "false")}"
            : f.Kind == RecordFieldKind.Integer ? $"{f.Name}={f.Integer.ToString(CultureInfo.InvariantCulture)}"
            : $"{f.Name}={f.Text}"));

    private static string E(string? text) => HtmlText.Escape(text);

    private static string N(long value) => value.ToString(CultureInfo.InvariantCulture);

    private static string F(double value, string format) => value.ToString(format, CultureInfo.InvariantCulture);
}
