using System.Xml.Linq;
using DescentOps.Reports.Html;
using DescentOps.Reports.Plotting;

namespace DescentOps.Reports.Tests;

/// <summary>What a reader trips over in a report: words for missing values, labels for keys, marks on every plot.</summary>
[Collection(RunLogsCollection.Name)]
public sealed class ReadableReportTests(RunLogs logs)
{
    private static readonly XNamespace Html = "http://www.w3.org/1999/xhtml";
    private static readonly XNamespace Svg = "http://www.w3.org/2000/svg";

    [Fact]
    public void Missing_values_are_words_and_labels_are_not_keys()
    {
        var page = ReportTests.Parse(logs.DefaultReport);
        var outcome = page.Descendants().Single(e => (string?)e.Attribute("id") == "outcome");
        var figures = outcome.Descendants(Html + "tr").ToDictionary(r => r.Element(Html + "th")!.Value, r => r.Element(Html + "td")!.Value, StringComparer.Ordinal);
        Assert.DoesNotContain(figures.Values, v => v.Contains("NaN", StringComparison.Ordinal) || v.Contains("E+", StringComparison.Ordinal));
        Assert.DoesNotContain(figures.Keys, k => k.Contains('_', StringComparison.Ordinal) || k.StartsWith("fault.", StringComparison.Ordinal));
        // The default run's power dip is never detected by a rule (it has none): the summary's NaN reads "never".
        Assert.Equal("never", figures["fault bus-sag-day-30: detected after"]);
        Assert.Equal("none", figures["vehicles lost"]);

        Assert.Equal("never", FigureFormatter.Missing("fault.x.first_action_after_s", double.NaN));
        Assert.Equal("not reached", FigureFormatter.Missing("breakthrough_t_s", double.NaN));
        Assert.Equal("0.0000123457", FigureFormatter.Plain(1.234567e-5));
        Assert.Equal("87805303822", FigureFormatter.Plain(87_805_303_821.55879));
    }

    [Fact]
    public void Every_plot_shades_and_names_the_fault_and_regimes_read_as_words()
    {
        var page = ReportTests.Parse(logs.DefaultReport);
        foreach (var definition in ReportPlots.Default)
        {
            var texts = Texts(page, definition.Id);
            Assert.Contains("fault active", texts);
            Assert.Contains("bus-sag-day-30", texts);
        }

        var depth = Texts(page, "depth");
        Assert.Contains("melting", depth);
        Assert.Contains("at ocean", depth);
        Assert.DoesNotContain("AtOcean", depth);
        // One line per vehicle, named as the scenario names it, not by its component id.
        var battery = Texts(page, "vehicle-battery");
        Assert.Contains("wisp-1", battery);
        Assert.DoesNotContain("vehicle-wisp-1", battery);
    }

    [Fact]
    public void A_short_fault_on_a_long_axis_keeps_a_visible_width()
    {
        // 12 h on a year: 0.5 d of 365 d is about a pixel of 770; the band is drawn at least 0.7 % of the axis.
        var fault = new FaultSpan("half-day", 100, 100.5, Cleared: true);
        var end = SvgPlotRenderer.VisibleEndDay(fault, 365);
        Assert.True((end - 100) / 365 * 770 >= 5, $"{(end - 100) / 365 * 770} px");
        Assert.Equal(200, SvgPlotRenderer.VisibleEndDay(new FaultSpan("long", 100, 200, true), 365));
    }

    [Fact]
    public void Labels_that_would_overlap_go_to_other_rows_or_are_left_out()
    {
        var rows = LabelRows.Assign([100, 101, 102, 103, 400], ["melting", "stopped", "melting", "stopped", "at ocean"], 3);
        Assert.Equal([0, 1, 2, -1, 0], rows);
    }

    [Fact]
    public void The_latency_axis_starts_at_zero_instead_of_magnifying_microseconds()
    {
        // Light time plus the station's delay is the same for every frame to a few microseconds; the axis shows
        // minutes from zero, so its ticks are whole numbers and 0 is among them.
        var ticks = Texts(ReportTests.Parse(logs.DefaultReport), "ground-latency");
        Assert.Contains("0", ticks);
        Assert.DoesNotContain(ticks, t => t.Contains("E-", StringComparison.Ordinal) || t.Contains('+', StringComparison.Ordinal));
    }

    [Fact]
    public void A_line_breaks_across_a_blind_period()
    {
        // Frames every 0.1 d, then none from day 2 to day 9 (a dead link), then every 0.1 d again.
        var days = Enumerable.Range(0, 21).Select(i => i * 0.1).Concat(Enumerable.Range(0, 11).Select(i => 9 + (i * 0.1))).ToArray();
        var line = new PlotSeries("latency", days, days.Select(_ => 60.0).ToArray());
        var gaps = BlindGaps.Find(days);
        var gap = Assert.Single(gaps);
        Assert.Equal((2.0, 9.0), (Math.Round(gap.From, 9), Math.Round(gap.To, 9)));
        var pieces = BlindGaps.Split(line, gaps);
        Assert.Equal(2, pieces.Count);
        Assert.Equal(2.0, pieces[0].Days[^1], 9);
        Assert.Equal(9.0, pieces[1].Days[0], 9);
    }

    [Theory]
    [InlineData(2 * 3600.0, "min")]
    [InlineData(1.6 * 86_400, "h")]
    [InlineData(113 * 86_400.0, "d")]
    public void The_time_unit_follows_the_run_s_length(double lengthS, string unit)
    {
        Assert.Equal(unit, TimeUnit.For(lengthS).Symbol);
    }

    [Fact]
    public void The_default_report_reads_time_in_days_on_every_axis()
    {
        var page = ReportTests.Parse(logs.DefaultReport);
        Assert.All(ReportPlots.Default, d => Assert.Contains("mission time (d)", Texts(page, d.Id)));
    }

    [Fact]
    public void The_page_carries_the_fonts_its_plots_were_laid_out_with()
    {
        var html = File.ReadAllText(logs.DefaultReport);
        Assert.Contains("font-src data:", html, StringComparison.Ordinal);
        var fonts = System.Text.RegularExpressions.Regex.Matches(html, @"@font-face \{ font-family: ""([^""]+)""; font-weight: (\w+);[^}]*base64,([A-Za-z0-9+/=]+)\)");
        Assert.Equal(2, fonts.Count);
        Assert.All(fonts, f => Assert.Equal(PlotFonts.Family, f.Groups[1].Value));
        var regular = fonts.Single(f => f.Groups[2].Value == "normal").Groups[3].Value;
        var shipped = File.ReadAllBytes(Path.Combine(RepositoryFiles.Root, "src", "DescentOps.Reports", "Fonts", "DejaVuSans.ttf"));
        Assert.Equal(shipped, Convert.FromBase64String(regular));
    }

    [Fact]
    public void The_report_keeps_the_first_notable_events_and_counts_them_all()
    {
        var log = RunLog.Load(logs.DefaultLog);
        var facts = LogFacts.Of(logs.DefaultLog);
        Assert.Equal(facts.Events, log.EventCount);
        Assert.InRange(log.NotableEvents.Count, 1, RunLog.MaxNotableEvents);
        Assert.True(log.NotableCount >= log.NotableEvents.Count);
    }

    private static List<string> Texts(XDocument page, string plotId) =>
        page.Descendants().Single(e => (string?)e.Attribute("id") == "plot-" + plotId)
            .Descendants(Svg + "text").Select(t => t.Value.Trim()).Where(t => t.Length > 0).ToList();
}
