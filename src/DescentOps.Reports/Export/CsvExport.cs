using System.Globalization;
using System.Text;
using DescentOps.Journal;
using DescentOps.Records.Kinds;

namespace DescentOps.Reports.Export;

/// <summary>
/// Writes a log as two CSV files into a folder: <c>events.csv</c> (every event, its data as one JSON cell) and
/// <c>telemetry.csv</c> (one row per <c>probe.telemetry</c> event, one column per field) for spreadsheets. In a run with
/// landers, <c>events.csv</c>'s <c>lander</c> column names each event's lander (empty for the shared link's own events
/// and in runs without landers), and <c>telemetry.csv</c> has the probe records' <c>lander</c> field as a column.
/// </summary>
public static class CsvExport
{
    public const string EventsFile = "events.csv";
    public const string TelemetryFile = "telemetry.csv";
    public const string TelemetryKind = ProbeRecords.Telemetry;

    private static readonly UTF8Encoding Utf8 = new(encoderShouldEmitUTF8Identifier: false);

    /// <param name="logPath">The log.</param>
    /// <param name="directory">The folder to write into (created if missing).</param>
    /// <param name="progress">Called now and then with the share of the work done (0 to 1): the log is read twice.</param>
    public static CsvExportResult Write(string logPath, string directory, Action<double>? progress = null)
    {
        Directory.CreateDirectory(directory);
        var eventsPath = Path.Combine(directory, EventsFile);
        var telemetryPath = Path.Combine(directory, TelemetryFile);
        long events = 0, rows = 0;
        long? truncated = null;
        var columns = new List<string>();
        var seen = new HashSet<string>(StringComparer.Ordinal);

        // Pass 1: every event, and the union of telemetry field names in order of first appearance (a field that
        // appears later in the run, after a software change for instance, still gets a column).
        AtomicFile.Write(eventsPath, partial =>
        {
            using var output = new StreamWriter(partial, append: false, Utf8, 1 << 16);
            output.Write(CsvText.Row(["seq", "t_s", "source", "lander", "kind", "severity", "data"]));
            using var reader = Open(logPath, progress, from: 0);
            foreach (var e in reader.ReadAll().OfType<EventEntry>())
            {
                events++;
                output.Write(CsvText.Row([
                    e.Sequence.ToString(CultureInfo.InvariantCulture), DataJson.Number(e.TimeSeconds), CsvText.Cell(e.Source),
                    CsvText.Cell(Journal.Querying.EventFilter.LanderOf(e) ?? ""), CsvText.Cell(e.Kind), e.Severity.ToString().ToLowerInvariant(), CsvText.Cell(DataJson.Of(e.Data))]));
                if (e.Kind != TelemetryKind) continue;
                foreach (var f in e.Data)
                {
                    if (seen.Add(f.Name)) columns.Add(f.Name);
                }
            }

            truncated = reader.IsTruncated ? reader.TruncatedAtLine : null;
        });

        AtomicFile.Write(telemetryPath, partial =>
        {
            using var output = new StreamWriter(partial, append: false, Utf8, 1 << 16);
            output.Write(CsvText.Row(["seq", "t_s", "source", .. columns.Select(CsvText.Cell)]));
            using var reader = Open(logPath, progress, from: 0.5);
            var cells = new string[columns.Count];
            foreach (var e in reader.ReadAll().OfType<EventEntry>().Where(e => e.Kind == TelemetryKind))
            {
                rows++;
                Array.Fill(cells, "");
                foreach (var f in e.Data) cells[columns.IndexOf(f.Name)] = CsvText.Cell(f);
                output.Write(CsvText.Row([e.Sequence.ToString(CultureInfo.InvariantCulture), DataJson.Number(e.TimeSeconds), CsvText.Cell(e.Source), .. cells]));
            }
        });

        return new CsvExportResult(eventsPath, telemetryPath, events, rows, truncated);
    }

    private static JournalReader Open(string logPath, Action<double>? progress, double from) =>
        progress is null ? JournalReader.Open(logPath) : new JournalReader(ReadProgressStream.OpenFile(logPath, share => progress(from + share / 2)));

    /// <summary>The default folder: the log's path without its extension, plus <c>-csv</c>.</summary>
    public static string DefaultDirectory(string logPath) => Path.ChangeExtension(logPath, null) + "-csv";
}
