using System.Globalization;
using DescentOps.Records;
using DescentOps.Reports.Plotting;

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
    public const int MaxEventRows = RunLog.MaxNotableEvents;

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
        Line("<meta http-equiv=\"Content-Security-Policy\" content=\"default-src 'none'; style-src 'unsafe-inline'; font-src data:\" />");
        Line("<meta name=\"viewport\" content=\"width=device-width, initial-scale=1\" />");
        Line($"<title>Post-mortem: {E(manifest.ScenarioName)}, seed {manifest.Seed.ToString(CultureInfo.InvariantCulture)}</title>");
        // The plots' text is set in the fonts the plots were laid out with, carried in the page itself.
        Line($"<style>{EmbeddedFontFaces.Css}{ReportStyle.Css}</style>");
        Line("</head>");
        Line("<body>");
        Line("<header>");
        Line($"<h1>Post-mortem: {E(manifest.ScenarioName)}</h1>");
        Line($"<p class=\"run\">seed {manifest.Seed.ToString(CultureInfo.InvariantCulture)} · log {E(Path.GetFileName(log.Path))} · written by {E(manifest.ToolVersion)}</p>");
        Line("</header>");

        var unit = TimeUnit.For(log.LengthS);
        if (log.IsTruncated) Truncation(log);
        Outcome(log, unit);
        Landers(log, unit);
        Plots(plots, unit);
        NotableEvents(log, unit);
        Inputs(log);
        CautionsSection();

        Line($"<footer><p>Made by {E(generator)} from {E(Path.GetFileName(log.Path))}; figures come from the log alone.</p></footer>");
        Line("</body>");
        Line("</html>");
    }

    /// <summary>A run with landers: a section for each lander's figures, and one for the link they share.</summary>
    private void Landers(RunLog log, TimeUnit unit)
    {
        if (log.Landers.Count == 0) return;
        Line("<section id=\"landers\">");
        Line("<h2>Landers</h2>");
        foreach (var lander in log.Landers)
        {
            Line($"<section id=\"lander-{E(lander.Name)}\">");
            Line($"<h3>{E(lander.Name)}</h3>");
            Line("<dl>");
            Pair("final depth", lander.FinalDepthM is { } depth ? F(depth, "0.0") + " m" + (lander.FinalRegime is { } regime ? $" ({regime})" : "") : "no frame");
            Pair("breakthrough", lander.BreakthroughTimeS is { } b ? unit.Format(b) + " " + unit.Symbol : "not reached");
            Pair("frames", $"{N(lander.FramesSent)} sent, {N(lander.FramesOnGround)} heard by the team, {N(lander.FramesLost)} lost");
            Pair("last heard", lander.LastHeardS is { } heard ? unit.Format(heard) + " " + unit.Symbol : "never");
            Pair("faults injected", N(lander.FaultsInjected) + (lander.StationFailed ? "; its station failed" : ""));
            Line("</dl>");
            Line("</section>");
        }

        if (log.SharedLink is { } link)
        {
            Line("<section id=\"shared-link\">");
            Line("<h3>The shared link home</h3>");
            Line("<dl>");
            Pair("channels", $"{N(link.Channels)} ({link.Policy.Replace('_', ' ')})");
            Pair("frames carried", N(link.FramesCarried));
            Pair("channel use", F(100 * link.Use(log.LengthS), "0.###") + " % of the channels' time on the air");
            Pair("most channels busy at once", N(link.MostBusy));
            Line("</dl>");
            Line("</section>");
        }

        Line("</section>");
    }

    private void Truncation(RunLog log)
    {
        Line("<section class=\"truncated\" id=\"truncation\">");
        Line("<h2>Truncated log</h2>");
        Line($"<p><strong>This log is truncated at line {N(log.TruncatedAtLine ?? 0)}.</strong> The run's summary line is missing, so its outcome is unknown. Everything below comes from the {N(log.EventCount)} events before that line, which are intact (the hash chain holds up to there).</p>");
        Line("</section>");
    }

    private void Outcome(RunLog log, TimeUnit unit)
    {
        Line("<section id=\"outcome\">");
        Line("<h2>Outcome</h2>");
        var figures = new List<SummaryFigure>();
        if (log.Summary is { } s)
        {
            var css = s.Summary.OutcomeKind == "Completed" ? "completed" : "not-completed";
            Line($"<p class=\"verdict {css}\" id=\"verdict\">{E(HumanText.Sentence(s.Summary.OutcomeKind))}: {E(s.Summary.Reason)}</p>");
            figures.Add(new SummaryFigure("simulated time", FigureFormatter.Duration(s.Summary.FinalTimeS)));
            // The summary's count of vehicles lost is shown by the row below, which names each one.
            figures.AddRange(s.Summary.Data.Where(f => !FigureFormatter.IsCriterion(f.Name) && f.Name != "vehicles_lost").Select(FigureFormatter.Format));
        }
        else
        {
            Line("<p class=\"verdict unknown\" id=\"verdict\">Outcome unknown: the log ends before its summary.</p>");
            Line("<p class=\"note\">Figures as far as the log goes:</p>");
            figures.AddRange(AsFarAsItGoes(log));
        }

        figures.Add(new SummaryFigure("vehicles lost", log.VehiclesLost.Count == 0
            ? "none"
            : string.Join("; ", log.VehiclesLost.Select(v => $"{HumanText.Source(v.Source)} at {unit.Format(v.TimeS)} {unit.Symbol}: {v.Reason}"))));
        Line("<table class=\"figures\">");
        foreach (var f in figures) Line($"<tr><th scope=\"row\">{E(f.Label)}</th><td>{E(f.Value)}</td></tr>");
        Line("</table>");

        // Pass/fail criteria, when the run was judged against some: each with its verdict as the summary gives it.
        var criteria = log.Summary?.Summary.Data.Where(f => FigureFormatter.IsCriterion(f.Name)).ToList() ?? [];
        if (criteria.Count > 0)
        {
            Line("<h3>Criteria</h3>");
            Line("<table class=\"figures\" id=\"criteria\">");
            foreach (var f in criteria) Line($"<tr><th scope=\"row\">{E(FigureFormatter.CriterionName(f.Name))}</th><td>{E(FigureFormatter.Verdict(f))}</td></tr>");
            Line("</table>");
        }

        Line("</section>");
    }

    /// <summary>For a log without its summary: the last values the log holds, each labelled as such.</summary>
    private static IEnumerable<SummaryFigure> AsFarAsItGoes(RunLog log)
    {
        yield return new SummaryFigure("events read", N(log.EventCount));
        if (log.EventCount > 0) yield return new SummaryFigure("last event at", FigureFormatter.Duration(log.LastEventTimeS));
        if (log.LastTelemetry is not { } lastTelemetry) yield break;
        foreach (var name in new[] { "depth_m", "energy_used_j" })
        {
            var field = lastTelemetry.FirstOrDefault(f => f.Name == name);
            if (field.Name is not null) yield return new SummaryFigure($"last reported {FigureFormatter.Label(name)}", FigureFormatter.Value(field));
        }

        yield return new SummaryFigure("breakthrough", log.BreakthroughTimeS is { } breakthrough ? FigureFormatter.Duration(breakthrough) : "not in the log");
    }

    private void Plots(IReadOnlyList<RenderedPlot> plots, TimeUnit unit)
    {
        Line("<section id=\"plots\">");
        Line("<h2>Plots</h2>");
        Line($"<p class=\"note\">Time runs in {E(UnitName(unit))} of simulated mission time. Shaded bands are active faults, labelled with their names along the top (a short fault is drawn a few pixels wide); dashed lines are changes of the probe's regime, labelled with the new regime along the bottom; a line breaks where its data stop for a while.</p>");
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

    private void NotableEvents(RunLog log, TimeUnit unit)
    {
        var notable = log.NotableEvents;
        Line("<section id=\"events\">");
        Line("<h2>Notable events</h2>");
        Line($"<p class=\"note\">{N(log.NotableCount)} events of severity notice or above.</p>");
        if (notable.Count > 0)
        {
            Line("<table id=\"notable\">");
            Line($"<thead><tr><th>time ({E(unit.Symbol)})</th><th>t (s)</th><th>source</th><th>kind</th><th>severity</th><th>data</th></tr></thead>");
            Line("<tbody>");
            foreach (var e in notable)
            {
                var severity = e.Severity.ToString().ToLowerInvariant();
                Line($"<tr class=\"sev-{severity}\"><td class=\"num\">{unit.Format(e.TimeSeconds)}</td><td class=\"num\">{F(e.TimeSeconds, "F0")}</td><td>{E(e.Source)}</td><td>{E(e.Kind)}</td><td class=\"sev\">{severity}</td><td class=\"data\">{E(Data(e.Data))}</td></tr>");
            }

            Line("</tbody>");
            Line("</table>");
            if (log.NotableCount > notable.Count)
            {
                Line($"<p class=\"note\">{N(log.NotableCount - notable.Count)} more not shown; list them with <code>descentops events LOG --severity notice</code>.</p>");
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

    private static string UnitName(TimeUnit unit) => unit.Symbol switch { "min" => "minutes", "h" => "hours", _ => "days" };

    private void Pair(string term, string value) => Line($"<dt>{E(term)}</dt><dd>{E(value)}</dd>");

    private void Line(string text) => _out.Write(text + "\n");

    private static string Data(IReadOnlyList<RecordField> data) =>
        string.Join(", ", data.Select(f => f.Kind == RecordFieldKind.Number
            ? $"{f.Name}={FigureFormatter.Plain(f.Number)}"
            : f.Kind == RecordFieldKind.Boolean ? $"{f.Name}={(f.Integer != 0 ? "true" : "false")}"
            : f.Kind == RecordFieldKind.Integer ? $"{f.Name}={f.Integer.ToString(CultureInfo.InvariantCulture)}"
            : $"{f.Name}={f.Text}"));

    private static string E(string? text) => HtmlText.Escape(text);

    private static string N(long value) => value.ToString(CultureInfo.InvariantCulture);

    private static string F(double value, string format) => value.ToString(format, CultureInfo.InvariantCulture);
}
