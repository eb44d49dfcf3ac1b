using DescentOps.Records;

namespace DescentOps.Engine.Tests.Support;

/// <summary>
/// Keeps every record as one line of text, so that two runs compare with a plain sequence equality and a
/// difference shows as a readable line in the assertion message.
/// </summary>
public sealed class CollectingJournalSink : IJournalSink
{
    private readonly List<string> _lines = [];

    public IReadOnlyList<string> Lines => _lines;

    public void Write(JournalRecord record) => _lines.Add(Format(record));

    public static string Format(JournalRecord record) =>
        $"{record.Time.Ticks}|{record.Source}|{record.Kind}|{record.Severity}|{string.Join(",", record.Fields)}";
}
