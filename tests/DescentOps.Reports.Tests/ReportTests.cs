using System.Globalization;
using System.Xml;
using System.Xml.Linq;
using DescentOps.Reports.Html;
using DescentOps.Reports.Plotting;

namespace DescentOps.Reports.Tests;

[Collection(RunLogsCollection.Name)]
public sealed class ReportTests(RunLogs logs)
{
    private static readonly XNamespace Html = "http://www.w3.org/1999/xhtml";
    private static readonly XNamespace Svg = "http://www.w3.org/2000/svg";

    [Fact]
    public void The_report_is_well_formed_xhtml_and_holds_every_plot_with_its_text()
    {
        var page = Parse(logs.DefaultReport);
        foreach (var definition in ReportPlots.Default)
        {
            var figure = ById(page, "plot-" + definition.Id);
            Assert.Equal(Html + "figure", figure.Name);
            var svg = Assert.Single(figure.Elements(Svg + "svg"));
            // Text elements with content prove that a font was found: without one ScottPlot draws none.
            var texts = svg.Descendants(Svg + "text").Select(t => t.Value.Trim()).Where(t => t.Length > 0).ToList();
            Assert.Contains(definition.Title, texts);
            Assert.Contains(definition.YLabel, texts);
            Assert.All(svg.Descendants(Svg + "text"), t => Assert.Equal(PlotFonts.Family, (string?)t.Attribute("font-family")));
        }

        // Ids must be unique across the inlined plots, or one plot's clip path would clip another.
        var ids = page.Descendants().Select(e => (string?)e.Attribute("id")).Where(id => id is not null).ToList();
        Assert.Equal(ids.Count, ids.Distinct(StringComparer.Ordinal).Count());
    }

    [Fact]
    public void The_depth_plot_marks_the_fault_and_the_regime_changes()
    {
        var depth = ById(Parse(logs.DefaultReport), "plot-depth");
        var texts = depth.Descendants(Svg + "text").Select(t => t.Value.Trim()).ToList();
        Assert.Contains("fault active", texts);
        Assert.Contains("melting", texts);
        Assert.Contains("at ocean", texts);
    }

    [Fact]
    public void The_report_opens_with_the_outcome_and_the_summary_figures()
    {
        var facts = LogFacts.Of(logs.DefaultLog);
        var summary = facts.Summary!.Value;
        var page = Parse(logs.DefaultReport);
        var verdict = ById(page, "verdict").Value;
        Assert.Equal($"{summary.GetProperty("outcome").GetString()}: {summary.GetProperty("reason").GetString()}", verdict);

        var figures = ById(page, "outcome").Descendants(Html + "tr")
            .ToDictionary(r => r.Element(Html + "th")!.Value, r => r.Element(Html + "td")!.Value, StringComparer.Ordinal);
        var data = summary.GetProperty("data");
        var breakthrough = data.GetProperty("breakthrough_t_s").GetDouble();
        Assert.Equal(string.Create(CultureInfo.InvariantCulture, $"{breakthrough / 86400:F3} d ({breakthrough:F0} s)"), figures["time to breakthrough"]);
        Assert.Equal(string.Create(CultureInfo.InvariantCulture, $"{data.GetProperty("final_depth_m").GetDouble():F1} m"), figures["final depth"]);
        Assert.StartsWith(string.Create(CultureInfo.InvariantCulture, $"{data.GetProperty("energy_used_j").GetDouble() / 3.6e9:F2} MWh"), figures["energy used"]);
        Assert.Equal(data.GetProperty("faults_injected").GetInt64().ToString(CultureInfo.InvariantCulture), figures["faults injected"]);

        // Outcome before plots, plots before events: the order a reader needs them in.
        var sections = page.Descendants(Html + "section").Select(s => (string?)s.Attribute("id")).ToList();
        Assert.Equal(["outcome", "plots", "events", "inputs", "cautions"], sections);
        Assert.Null(FindById(page, "truncation"));
    }

    [Fact]
    public void The_report_lists_notable_events_and_carries_the_cautions()
    {
        var page = Parse(logs.DefaultReport);
        var rows = ById(page, "notable").Descendants(Html + "tbody").Single().Elements(Html + "tr").ToList();
        var kinds = rows.Select(r => r.Elements(Html + "td").ElementAt(3).Value).ToList();
        Assert.Contains("fault.injected", kinds);
        Assert.Contains("fault.cleared", kinds);
        Assert.Contains("probe.breakthrough", kinds);
        Assert.DoesNotContain("probe.telemetry", kinds);

        var cautions = ById(page, "cautions").Elements(Html + "p").Select(p => p.Value).ToList();
        Assert.Equal(Cautions.Paragraphs, cautions);
        Assert.Equal(2, cautions.Count);
    }

    [Fact]
    public void The_embedded_cautions_are_the_readme_cautions()
    {
        Assert.Equal(RepositoryFiles.Normalized(RepositoryFiles.ReadmeSection("Cautions")), RepositoryFiles.Normalized(Cautions.Text));
    }

    [Fact]
    public void A_truncated_log_gets_a_report_that_says_so_with_the_line()
    {
        var path = logs.File("truncated.html");
        var log = RunLog.Load(logs.TruncatedLog);
        PostMortemReport.Write(log, path, "DescentOps tests");
        var page = Parse(path);
        var banner = ById(page, "truncation");
        Assert.Contains($"truncated at line {logs.TruncatedAtLine}", banner.Value, StringComparison.Ordinal);
        Assert.StartsWith("Outcome unknown", ById(page, "verdict").Value, StringComparison.Ordinal);
        // The banner comes before everything else.
        Assert.Equal("truncation", (string?)page.Descendants(Html + "section").First().Attribute("id"));
        Assert.NotNull(ById(page, "plot-depth").Element(Svg + "svg"));
        Assert.False(File.Exists(path + AtomicFile.PartialSuffix));
    }

    [Fact]
    public void A_plot_whose_data_is_absent_is_skipped_with_a_note()
    {
        var log = RunLog.Load(logs.DefaultLog);
        var tilt = new PlotDefinition("tilt", "Probe tilt", "tilt (deg)", [new SeriesDefinition("probe.attitude", "tilt_deg", "tilt")]);
        var path = logs.File("with-absent-plot.html");
        var plots = PostMortemReport.Write(log, path, "DescentOps tests", [ReportPlots.Default[0], tilt]);
        Assert.True(plots[1].Skipped);
        var note = ById(Parse(path), "plot-tilt");
        Assert.Equal(Html + "p", note.Name);
        Assert.Contains("tilt_deg of probe.attitude", note.Value, StringComparison.Ordinal);
    }

    [Fact]
    public void Thinning_keeps_a_short_dip_and_the_last_point()
    {
        var days = Enumerable.Range(0, 100_000).Select(i => i / 1000.0).ToArray();
        var values = days.Select(d => 6.0).ToArray();
        values[54_321] = 1.0;
        var thinned = SeriesThinner.Thin(new PlotSeries("power", days, values), 1_000);
        Assert.True(thinned.Count <= 1_001);
        Assert.Contains(1.0, thinned.Values);
        Assert.Equal(days[^1], thinned.Days[^1]);
    }

    internal static XDocument Parse(string path)
    {
        var settings = new XmlReaderSettings { DtdProcessing = DtdProcessing.Ignore };
        using var reader = XmlReader.Create(path, settings);
        return XDocument.Load(reader);
    }

    private static XElement ById(XDocument page, string id) => FindById(page, id) ?? throw new Xunit.Sdk.XunitException($"no element with id '{id}'");

    private static XElement? FindById(XDocument page, string id) => page.Descendants().FirstOrDefault(e => (string?)e.Attribute("id") == id);
}
