using System.Globalization;
using ScottPlot;

namespace DescentOps.Reports.Plotting;

/// <summary>Draws one <see cref="PlotDefinition"/> over a log as SVG with ScottPlot, headless.</summary>
public static class SvgPlotRenderer
{
    public const int WidthPx = 880;
    public const int HeightPx = 340;

    // Our own line colours: dark and saturated enough to tell apart on white and in greyscale print.
    private static readonly Color[] LineColours =
    [
        Color.FromHex("#1d4e89"), Color.FromHex("#c05a12"), Color.FromHex("#2a7f62"), Color.FromHex("#8c2f5a"), Color.FromHex("#5b4a9e"),
    ];

    private static readonly Color FaultFill = Color.FromHex("#d9342b").WithAlpha(0.3);
    private static readonly Color RegimeLine = Color.FromHex("#444444");

    public static RenderedPlot Render(RunLog log, PlotDefinition definition, FaultTimeline timeline)
    {
        ArgumentNullException.ThrowIfNull(log);
        ArgumentNullException.ThrowIfNull(definition);
        ArgumentNullException.ThrowIfNull(timeline);
        var series = definition.Series.SelectMany(s => SeriesExtractor.Extract(log, s)).Where(s => s.Count > 0).ToList();
        if (series.Count == 0)
        {
            var wanted = string.Join(", ", definition.Series.Select(s => $"{s.Field} of {s.Kind}").Distinct(StringComparer.Ordinal));
            return new RenderedPlot(definition, null, $"Not drawn: this log has no {wanted}.");
        }

        PlotFonts.Ensure();
        using var plot = new Plot();
        plot.Title(definition.Title);
        plot.XLabel("mission time (d)");
        plot.YLabel(definition.YLabel);

        var thinned = false;
        for (var i = 0; i < series.Count; i++)
        {
            var points = SeriesThinner.Thin(series[i]);
            thinned |= points.Count < series[i].Count;
            var line = plot.Add.ScatterLine(points.Days, points.Values, LineColours[i % LineColours.Length]);
            line.LineWidth = 1.6f;
            line.LegendText = points.Label;
        }

        if (definition.MarkTimeline) Mark(plot, timeline);
        if (definition.InvertY) plot.Axes.InvertY();
        if (series.Count > 1 || (definition.MarkTimeline && !timeline.IsEmpty)) plot.ShowLegend(Alignment.UpperRight);

        var svg = plot.GetSvgXml(WidthPx, HeightPx);
        // The one symptom of a missing font is silence: no <text> at all. A plot always has a title, so no text
        // means the fonts failed, and a report with blank axes must not go out looking fine.
        if (!svg.Contains("<text", StringComparison.Ordinal))
        {
            throw new InvalidOperationException($"Plot '{definition.Id}' was drawn without any text: ScottPlot found no usable font.");
        }

        var note = thinned
            ? string.Create(CultureInfo.InvariantCulture, $"Drawn from {series.Sum(s => s.Count)} points, thinned to each interval's lowest and highest value.")
            : null;
        return new RenderedPlot(definition, SvgInlining.Inline(svg, $"plot-{definition.Id}-"), note);
    }

    private static void Mark(Plot plot, FaultTimeline timeline)
    {
        var labelled = false;
        foreach (var fault in timeline.Faults)
        {
            // A fault shorter than a pixel would vanish; give it a minimum visible width instead.
            var span = plot.Add.HorizontalSpan(fault.StartDay, Math.Max(fault.EndDay, fault.StartDay + 0.2), FaultFill);
            span.LineWidth = 0;
            if (!labelled) span.LegendText = "fault active";
            labelled = true;
        }

        foreach (var regime in timeline.Regimes)
        {
            var line = plot.Add.VerticalLine(regime.Day, 1, RegimeLine, LinePattern.Dashed);
            line.Text = regime.To;
            line.LabelFontSize = 11;
            line.LabelBackgroundColor = Color.FromHex("#ffffff").WithAlpha(0.85);
            line.LabelFontColor = RegimeLine;
            line.ExcludeFromLegend = true;
        }
    }
}
