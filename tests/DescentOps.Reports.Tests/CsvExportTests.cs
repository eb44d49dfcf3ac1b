using System.Globalization;
using System.Text.Json;
using DescentOps.Reports.Export;

namespace DescentOps.Reports.Tests;

[Collection(RunLogsCollection.Name)]
public sealed class CsvExportTests(RunLogs logs)
{
    [Fact]
    public void Events_and_telemetry_files_hold_the_whole_log()
    {
        var folder = logs.File("csv");
        var result = CsvExport.Write(logs.DefaultLog, folder);
        var facts = LogFacts.Of(logs.DefaultLog);

        var events = CsvRows.Read(result.EventsPath);
        Assert.Equal(["seq", "t_s", "source", "lander", "kind", "severity", "data"], events[0]);
        Assert.Equal(facts.Events, events.Count - 1);
        var breakthrough = events.Single(r => r[4] == "probe.breakthrough");
        Assert.Equal("", breakthrough[3]);
        Assert.Equal(facts.BreakthroughTS, double.Parse(breakthrough[1], CultureInfo.InvariantCulture));
        using (var data = JsonDocument.Parse(breakthrough[6]))
        {
            Assert.Equal(2500.0, data.RootElement.GetProperty("depth_m").GetDouble());
        }

        var telemetry = CsvRows.Read(result.TelemetryPath);
        var depth = Array.IndexOf(telemetry[0], "depth_m");
        Assert.True(depth >= 3, "telemetry.csv has a depth_m column");
        Assert.Contains("head_power_w", telemetry[0]);
        Assert.Equal(facts.TelemetryEvents, telemetry.Count - 1);
        Assert.Equal(facts.MaxTelemetryDepthM, telemetry.Skip(1).Max(r => double.Parse(r[depth], CultureInfo.InvariantCulture)));
        Assert.Null(result.TruncatedAtLine);
    }

    [Fact]
    public void A_truncated_log_exports_its_prefix_and_says_where_it_was_cut()
    {
        var result = CsvExport.Write(logs.TruncatedLog, logs.File("csv-truncated"));
        Assert.Equal(logs.TruncatedAtLine, result.TruncatedAtLine);
        Assert.Equal(LogFacts.Of(logs.TruncatedLog).Events, result.Events);
        Assert.Equal(result.Events, CsvRows.Read(result.EventsPath).Count - 1);
    }
}
