using System.Diagnostics.CodeAnalysis;

namespace DescentOps.Journal;

/// <summary>
/// Streams a journal back as typed entries, one line at a time. It checks layout (manifest first, summary
/// last, nothing after it) but not the hash chain: run <see cref="JournalVerifier"/> for that.
/// </summary>
/// <remarks>
/// A journal whose writer was killed ends in a cut line or simply lacks its summary. The reader treats both
/// as a normal end: it returns every whole line, then stops and sets <see cref="IsTruncated"/>, so that a
/// post-mortem can use everything the run managed to write. A malformed line anywhere else is an error.
/// </remarks>
public sealed class JournalReader : IDisposable
{
    private readonly Utf8LineSource _lines;
    private bool _sawSummary;
    private bool _finished;

    public JournalReader(Stream stream, bool leaveOpen = false)
    {
        ArgumentNullException.ThrowIfNull(stream);
        _lines = new Utf8LineSource(stream, leaveOpen);
    }

    /// <summary>True once reading has stopped at a cut last line or at an end without a summary.</summary>
    public bool IsTruncated { get; private set; }

    /// <summary>When <see cref="IsTruncated"/>, the 1-based line that is cut or where the summary should be.</summary>
    public long? TruncatedAtLine { get; private set; }

    public static JournalReader Open(string path) => new(Utf8LineSource.OpenFile(path));

    /// <summary>The next entry, or false at the end of the journal (check <see cref="IsTruncated"/>).</summary>
    /// <exception cref="InvalidDataException">A line is malformed or out of place.</exception>
    public bool TryRead([NotNullWhen(true)] out JournalEntry? entry)
    {
        entry = null;
        if (_finished)
        {
            return false;
        }

        if (!_lines.TryReadLine(out var line, out var terminated))
        {
            Finish(truncated: !_sawSummary, _lines.LineNumber + 1);
            return false;
        }

        var lineNumber = _lines.LineNumber;
        if (!terminated)
        {
            Finish(truncated: true, lineNumber);
            return false;
        }

        if (_sawSummary)
        {
            throw new InvalidDataException($"Journal line {lineNumber} follows the summary line.");
        }

        entry = JournalLineParser.Parse(line, lineNumber);
        var isManifest = entry is ManifestEntry;
        if (isManifest != (lineNumber == 1))
        {
            throw new InvalidDataException(isManifest
                ? $"Journal line {lineNumber} is a second manifest."
                : "Journal line 1 is not a manifest.");
        }

        _sawSummary = entry is SummaryEntry;
        return true;
    }

    /// <summary>Every entry in order, lazily; <see cref="IsTruncated"/> is meaningful once it is exhausted.</summary>
    public IEnumerable<JournalEntry> ReadAll()
    {
        while (TryRead(out var entry))
        {
            yield return entry;
        }
    }

    public void Dispose() => _lines.Dispose();

    private void Finish(bool truncated, long atLine)
    {
        _finished = true;
        IsTruncated = truncated;
        TruncatedAtLine = truncated ? atLine : null;
    }
}
