using System.Globalization;
using ScottPlot;

namespace DescentOps.Reports.Plotting;

/// <summary>Draws one <see cref="PlotDefinition"/> over a log as SVG with ScottPlot, headless.</summary>
public static class SvgPlotRenderer
{
    public const int WidthPx = 880;
    public const int HeightPx = 340;

    /// <summary>A fault is drawn at least this share of the time axis wide (about 6 px), however short it was.</summary>
    public const double MinFaultWidthShare = 0.007;

    /// <summary>A vertical axis whose data vary by less than this share of their size is drawn from zero.</summary>
    public const double FlatShare = 0.05;

    /// <summary>Rows of labels along the top (faults) and the bottom (regimes) of the data area.</summary>
    public const int LabelRowCount = 3;

    // Pixels of the data area, roughly: the axes' labels and ticks take the rest of the width.
    private const double DataWidthPx = WidthPx - 110;
    private const float LabelRowPx = 14;

    // Our own line colours: dark and saturated enough to tell apart on white and in greyscale print.
    private static readonly Color[] LineColours =
    [
        Color.FromHex("#1d4e89"), Color.FromHex("#c05a12"), Color.FromHex("#2a7f62"), Color.FromHex("#8c2f5a"), Color.FromHex("#5b4a9e"),
    ];

    private static readonly Color FaultFill = Color.FromHex("#d9342b").WithAlpha(0.3);
    private static readonly Color FaultText = Color.FromHex("#9b1c14");
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
        var unit = TimeUnit.For(log.LengthS);
        using var plot = new Plot();
        plot.Title(definition.Title);
        plot.XLabel($"mission time ({unit.Symbol})");
        plot.YLabel(definition.YLabel);

        var thinned = false;
        var blind = 0;
        var lowest = double.PositiveInfinity;
        var highest = double.NegativeInfinity;
        for (var i = 0; i < series.Count; i++)
        {
            var gaps = BlindGaps.Find(series[i].Days);
            blind += gaps.Count;
            var points = SeriesThinner.Thin(series[i]);
            thinned |= points.Count < series[i].Count;
            var first = true;
            foreach (var piece in BlindGaps.Split(points, gaps))
            {
                var line = plot.Add.ScatterLine(piece.Days.Select(unit.FromDays).ToArray(), piece.Values, LineColours[i % LineColours.Length]);
                line.LineWidth = 1.6f;
                line.MarkerSize = piece.Count == 1 ? 4 : 0;
                if (first) line.LegendText = points.Label;
                first = false;
            }

            lowest = Math.Min(lowest, series[i].Values.Min());
            highest = Math.Max(highest, series[i].Values.Max());
        }

        var startDay = 0.0;
        var endDay = Math.Max(log.LengthS / 86_400, series.Max(s => s.Days[^1]));
        var left = MarkFaults(plot, timeline, unit, startDay, endDay);
        left += MarkRegimes(plot, timeline, unit, startDay, endDay);
        plot.Axes.SetLimitsX(unit.FromDays(startDay), unit.FromDays(endDay) * 1.01);
        if (highest - lowest < FlatShare * Math.Max(Math.Abs(highest), Math.Abs(lowest)))
        {
            // Nearly flat data (a light time with microseconds of jitter): from zero, so the axis shows the value,
            // not its last digits magnified.
            var low = Math.Min(0, lowest);
            var high = Math.Max(0, highest);
            var pad = (high - low) * 0.1;
            plot.Axes.SetLimitsY(low - (low < 0 ? pad : 0), high + (high > 0 ? pad : 0));
        }

        if (definition.InvertY) plot.Axes.InvertY();
        if (series.Count > 1 || timeline.Faults.Count > 0) plot.ShowLegend(Alignment.LowerRight);

        var svg = plot.GetSvgXml(WidthPx, HeightPx);
        // The one symptom of a missing font is silence: no <text> at all. A plot always has a title, so no text
        // means the fonts failed, and a report with blank axes must not go out looking fine.
        if (!svg.Contains("<text", StringComparison.Ordinal))
        {
            throw new InvalidOperationException($"Plot '{definition.Id}' was drawn without any text: ScottPlot found no usable font.");
        }

        var notes = new List<string>();
        if (thinned) notes.Add(string.Create(CultureInfo.InvariantCulture, $"Drawn from {series.Sum(s => s.Count)} points, thinned to each interval's lowest and highest value."));
        if (blind > 0) notes.Add(string.Create(CultureInfo.InvariantCulture, $"The line breaks at {blind} blind period{(blind == 1 ? "" : "s")} (no data for over {BlindGaps.GapFactor:G} times the usual spacing)."));
        if (left > 0) notes.Add(string.Create(CultureInfo.InvariantCulture, $"{left} label{(left == 1 ? "" : "s")} left out where {(left == 1 ? "it" : "they")} would overlap; the events table lists every change."));
        return new RenderedPlot(definition, SvgInlining.Inline(svg, $"plot-{definition.Id}-"), notes.Count == 0 ? null : string.Join(" ", notes));
    }

    /// <summary>Where a fault's band ends on an axis this many days long: a fault shorter than a few pixels would vanish, so it gets a minimum visible width.</summary>
    public static double VisibleEndDay(FaultSpan fault, double axisDays)
    {
        ArgumentNullException.ThrowIfNull(fault);
        return Math.Max(fault.EndDay, fault.StartDay + (MinFaultWidthShare * axisDays));
    }

    private static double ToPx(double day, double startDay, double endDay) => (day - startDay) / Math.Max(endDay - startDay, 1e-12) * DataWidthPx;

    private static int MarkFaults(Plot plot, FaultTimeline timeline, TimeUnit unit, double startDay, double endDay)
    {
        var labelled = false;
        foreach (var fault in timeline.Faults)
        {
            var end = VisibleEndDay(fault, endDay - startDay);
            var span = plot.Add.HorizontalSpan(unit.FromDays(fault.StartDay), unit.FromDays(end), FaultFill);
            span.LineWidth = 0;
            if (!labelled) span.LegendText = "fault active";
            labelled = true;
        }

        var rows = LabelRows.Assign(timeline.Faults.Select(f => ToPx(f.StartDay, startDay, endDay)).ToList(), timeline.Faults.Select(f => f.Name).ToList(), LabelRowCount);
        var left = 0;
        for (var i = 0; i < timeline.Faults.Count; i++)
        {
            if (rows[i] < 0) { left++; continue; }
            var line = plot.Add.VerticalLine(unit.FromDays(timeline.Faults[i].StartDay), 0, FaultFill);
            line.Text = timeline.Faults[i].Name;
            line.LabelOppositeAxis = true;
            line.LabelOffsetY = -rows[i] * LabelRowPx;
            Style(line, FaultText);
        }

        return left;
    }

    private static int MarkRegimes(Plot plot, FaultTimeline timeline, TimeUnit unit, double startDay, double endDay)
    {
        var texts = timeline.Regimes.Select(r => HumanText.Words(r.To)).ToList();
        var rows = LabelRows.Assign(timeline.Regimes.Select(r => ToPx(r.Day, startDay, endDay)).ToList(), texts, LabelRowCount);
        var left = 0;
        for (var i = 0; i < timeline.Regimes.Count; i++)
        {
            var line = plot.Add.VerticalLine(unit.FromDays(timeline.Regimes[i].Day), 1, RegimeLine, LinePattern.Dashed);
            if (rows[i] < 0) { left++; line.ExcludeFromLegend = true; continue; }
            line.Text = texts[i];
            line.LabelOffsetY = rows[i] * LabelRowPx;
            Style(line, RegimeLine);
        }

        return left;
    }

    private static void Style(ScottPlot.Plottables.VerticalLine line, Color text)
    {
        line.LabelFontSize = 11;
        line.LabelBackgroundColor = Color.FromHex("#ffffff").WithAlpha(0.85);
        line.LabelFontColor = text;
        line.ExcludeFromLegend = true;
    }
}
