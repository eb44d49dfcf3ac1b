using System.Text;
using DescentOps.Journal;

namespace DescentOps.Reports;

/// <summary>
/// A whole log read into memory, as far as it is intact: the report needs every event several times (one pass
/// per plot) and a default run is a few tens of thousands of lines, so holding it is simpler than re-reading.
/// </summary>
public sealed class RunLog
{
    private RunLog(string path, RunManifest manifest, string manifestChain, SummaryEntry? summary, IReadOnlyList<EventEntry> events, long? truncatedAtLine)
    {
        Path = path;
        Manifest = manifest;
        ManifestChain = manifestChain;
        Summary = summary;
        Events = events;
        TruncatedAtLine = truncatedAtLine;
    }

    public string Path { get; }

    public RunManifest Manifest { get; }

    /// <summary>The chain value of the manifest line: it differs between any two runs whose manifests differ at all.</summary>
    public string ManifestChain { get; }

    /// <summary>The summary line, or null when the log is truncated.</summary>
    public SummaryEntry? Summary { get; }

    public IReadOnlyList<EventEntry> Events { get; }

    public long? TruncatedAtLine { get; }

    public bool IsTruncated => TruncatedAtLine is not null;

    /// <exception cref="InvalidDataException">The log has no intact manifest or a malformed line.</exception>
    public static RunLog Load(string path)
    {
        using var reader = JournalReader.Open(path);
        ManifestEntry? manifest = null;
        SummaryEntry? summary = null;
        var events = new List<EventEntry>();
        foreach (var entry in reader.ReadAll())
        {
            switch (entry)
            {
                case ManifestEntry m: manifest = m; break;
                case EventEntry e: events.Add(e); break;
                case SummaryEntry s: summary = s; break;
            }
        }

        if (manifest is null) throw new InvalidDataException($"{path}: the log has no intact manifest line.");
        return new RunLog(path, manifest.Manifest, ReadManifestChain(path), summary, events, reader.IsTruncated ? reader.TruncatedAtLine : null);
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
}
