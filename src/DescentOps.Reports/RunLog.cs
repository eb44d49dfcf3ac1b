using System.Text;
using DescentOps.Records;
using DescentOps.Records.Kinds;
using DescentOps.Journal;
using DescentOps.Reports.Plotting;

namespace DescentOps.Reports;

/// <summary>
/// What the report needs from a log, as far as it is intact, gathered in one streaming pass: the manifest and
/// summary, the faults and regime changes, the points of each plotted series (two doubles a point), the first
/// notable events and the vehicles lost. A year-long log (hundreds of MB, millions of events) is never held as
/// events: memory grows with the plotted points only.
/// </summary>
public sealed class RunLog
{
    private const double SecondsPerDay = 86_400;
    private readonly Dictionary<SeriesDefinition, IReadOnlyList<PlotSeries>> _series;

    private RunLog(string path, RunManifest manifest, string manifestChain, Digest digest, long? truncatedAtLine)
    {
        Path = path;
        Manifest = manifest;
        ManifestChain = manifestChain;
        Summary = digest.Summary;
        TruncatedAtLine = truncatedAtLine;
        EventCount = digest.EventCount;
        LastEventTimeS = digest.LastEventTimeS;
        Timeline = digest.Timeline.Build(digest.LastEventTimeS / SecondsPerDay);
        NotableEvents = digest.Notable;
        NotableCount = digest.NotableCount;
        VehiclesLost = digest.VehiclesLost;
        LastTelemetry = digest.LastTelemetry;
        BreakthroughTimeS = digest.BreakthroughTimeS;
        Landers = [.. digest.Landers.Values];
        SharedLink = digest.SharedLink.Channels > 0 ? digest.SharedLink : null;
        _series = digest.Series.ToDictionary(p => p.Key, p => p.Value.Lines());
    }

    /// <summary>More notable rows than this is a log to filter with <c>descentops events</c>, not to read in a page.</summary>
    public const int MaxNotableEvents = 500;

    public string Path { get; }

    public RunManifest Manifest { get; }

    /// <summary>The chain value of the manifest line: it differs between any two runs whose manifests differ at all.</summary>
    public string ManifestChain { get; }

    /// <summary>The summary line, or null when the log is truncated.</summary>
    public SummaryEntry? Summary { get; }

    public long? TruncatedAtLine { get; }

    public bool IsTruncated => TruncatedAtLine is not null;

    /// <summary>Events read (every event line before the summary or the cut).</summary>
    public long EventCount { get; }

    /// <summary>Time of the last event read, or 0 without any.</summary>
    public double LastEventTimeS { get; }

    /// <summary>The run's length: the summary's final time, or the last event of a truncated log.</summary>
    public double LengthS => Summary?.Summary.FinalTimeS ?? LastEventTimeS;

    public FaultTimeline Timeline { get; }

    /// <summary>The first <see cref="MaxNotableEvents"/> events of severity notice and above.</summary>
    public IReadOnlyList<EventEntry> NotableEvents { get; }

    /// <summary>Events of severity notice and above, shown or not.</summary>
    public long NotableCount { get; }

    public IReadOnlyList<VehicleLoss> VehiclesLost { get; }

    /// <summary>The data of the last <c>probe.telemetry</c> event, or null.</summary>
    public IReadOnlyList<RecordField>? LastTelemetry { get; }

    public double? BreakthroughTimeS { get; }

    /// <summary>Each lander's figures in a run with landers, in order of first appearance; empty for one lander.</summary>
    public IReadOnlyList<LanderFigures> Landers { get; }

    /// <summary>The shared link home's figures in a run with landers; null for one lander.</summary>
    public SharedLinkFigures? SharedLink { get; }

    /// <summary>The lines of one series; a definition not gathered at load is read in a further streaming pass.</summary>
    public IReadOnlyList<PlotSeries> Series(SeriesDefinition definition)
    {
        ArgumentNullException.ThrowIfNull(definition);
        if (_series.TryGetValue(definition, out var lines)) return lines;
        var collector = new SeriesCollector(definition);
        using (var reader = JournalReader.Open(Path))
        {
            foreach (var entry in reader.ReadAll())
            {
                if (entry is EventEntry e) collector.Add(e);
            }
        }

        lines = collector.Lines();
        _series[definition] = lines;
        return lines;
    }

    /// <summary>Reads the log once, gathering the series of the default plots.</summary>
    /// <exception cref="InvalidDataException">The log has no intact manifest or a malformed line.</exception>
    public static RunLog Load(string path) => Load(path, ReportPlots.Gathered);

    /// <summary>Reads the log once, gathering the series of the default plots and reporting the share read.</summary>
    /// <exception cref="InvalidDataException">The log has no intact manifest or a malformed line.</exception>
    public static RunLog Load(string path, Action<double>? progress) => Load(path, ReportPlots.Gathered, progress);

    /// <summary>Reads the log once, gathering the given series.</summary>
    /// <exception cref="InvalidDataException">The log has no intact manifest or a malformed line.</exception>
    public static RunLog Load(string path, IEnumerable<SeriesDefinition> series, Action<double>? progress = null)
    {
        ArgumentNullException.ThrowIfNull(series);
        using var reader = progress is null ? JournalReader.Open(path) : new JournalReader(ReadProgressStream.OpenFile(path, progress));
        ManifestEntry? manifest = null;
        var digest = new Digest(series.Distinct());
        foreach (var entry in reader.ReadAll())
        {
            switch (entry)
            {
                case ManifestEntry m: manifest = m; break;
                case EventEntry e: digest.Add(e); break;
                case SummaryEntry s: digest.Summary = s; break;
            }
        }

        if (manifest is null) throw new InvalidDataException($"{path}: the log has no intact manifest line.");
        return new RunLog(path, manifest.Manifest, ReadManifestChain(path), digest, reader.IsTruncated ? reader.TruncatedAtLine : null);
    }

    /// <summary>
    /// The chain value sits at a fixed place at the end of every line (<c>,"chain":"…32 hex…"}</c>); the reader
    /// does not expose it, so it is taken from the raw first line.
    /// </summary>
    public static string ReadManifestChain(string path)
    {
        using var stream = File.OpenRead(path);
        using var text = new StreamReader(stream, Encoding.UTF8);
        var line = text.ReadLine() ?? throw new InvalidDataException($"{path}: the log is empty.");
        const string marker = ",\"chain\":\"";
        var at = line.LastIndexOf(marker, StringComparison.Ordinal);
        if (at < 0 || line.Length < at + marker.Length + 32) throw new InvalidDataException($"{path}: line 1 has no chain value.");
        return line.Substring(at + marker.Length, 32);
    }

    private sealed class Digest(IEnumerable<SeriesDefinition> series)
    {
        public Dictionary<SeriesDefinition, SeriesCollector> Series { get; } = series.ToDictionary(s => s, s => new SeriesCollector(s));

        public FaultTimeline.Builder Timeline { get; } = new();

        public List<EventEntry> Notable { get; } = [];

        public List<VehicleLoss> VehiclesLost { get; } = [];

        public SummaryEntry? Summary { get; set; }

        public long EventCount { get; private set; }

        public double LastEventTimeS { get; private set; }

        public long NotableCount { get; private set; }

        public IReadOnlyList<RecordField>? LastTelemetry { get; private set; }

        public double? BreakthroughTimeS { get; private set; }

        public Dictionary<string, LanderFigures> Landers { get; } = new(StringComparer.Ordinal);

        public SharedLinkFigures SharedLink { get; } = new();

        public void Add(EventEntry e)
        {
            EventCount++;
            if (Journal.Querying.EventFilter.LanderOf(e) is { } lander)
            {
                if (!Landers.TryGetValue(lander, out var figures)) Landers[lander] = figures = new LanderFigures(lander);
                figures.Add(e);
            }

            SharedLink.Add(e);
            LastEventTimeS = e.TimeSeconds;
            foreach (var collector in Series.Values) collector.Add(e);
            Timeline.Add(e);
            if (e.Severity >= Severity.Notice)
            {
                NotableCount++;
                if (Notable.Count < MaxNotableEvents) Notable.Add(e);
            }

            switch (e.Kind)
            {
                case ProbeRecords.Telemetry: LastTelemetry = e.Data; break;
                case ProbeRecords.Breakthrough: BreakthroughTimeS ??= e.TimeSeconds; break;
                case "vehicle.lost":
                    var reason = e.Data.FirstOrDefault(f => f.Name == "reason" && f.Kind == RecordFieldKind.Text).Text ?? "no reason given";
                    VehiclesLost.Add(new VehicleLoss(e.Source, e.TimeSeconds, reason));
                    break;
            }
        }
    }
}
