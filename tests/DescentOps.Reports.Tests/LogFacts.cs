using System.Text.Json;

namespace DescentOps.Reports.Tests;

/// <summary>
/// Facts about a log computed straight from its JSON lines with System.Text.Json, independently of the
/// journal reader and of the code under test, to check exports and reports against.
/// </summary>
internal sealed record LogFacts(long Events, double? BreakthroughTS, double MaxTelemetryDepthM, long TelemetryEvents, JsonElement? Summary)
{
    public static LogFacts Of(string path)
    {
        long events = 0, telemetry = 0;
        double? breakthrough = null;
        var maxDepth = double.NegativeInfinity;
        JsonElement? summary = null;
        foreach (var line in File.ReadLines(path))
        {
            JsonDocument document;
            try
            {
                document = JsonDocument.Parse(line);
            }
            catch (JsonException)
            {
                break; // the cut tail of a truncated log
            }

            var root = document.RootElement;
            switch (root.GetProperty("type").GetString())
            {
                case "event":
                    events++;
                    var kind = root.GetProperty("kind").GetString();
                    if (kind == "probe.breakthrough") breakthrough ??= root.GetProperty("t").GetDouble();
                    if (kind == "probe.telemetry")
                    {
                        telemetry++;
                        maxDepth = Math.Max(maxDepth, root.GetProperty("data").GetProperty("depth_m").GetDouble());
                    }

                    break;
                case "summary":
                    summary = root.Clone();
                    break;
            }
        }

        return new LogFacts(events, breakthrough, maxDepth, telemetry, summary);
    }
}
