using System.Text;

namespace DescentOps.Journal.Querying;

/// <summary>Streams the events of a journal that pass a filter, each with its original line.</summary>
public static class JournalQuery
{
    /// <summary>
    /// Matching events in log order. Reading stops quietly at a truncated tail; <paramref name="truncatedAtLine"/>
    /// receives the cut line's number once the sequence is exhausted.
    /// </summary>
    public static IEnumerable<(EventEntry Event, string Line)> Events(string path, EventFilter filter, Action<long>? truncatedAtLine = null)
    {
        using var lines = new Utf8LineSource(Utf8LineSource.OpenFile(path), leaveOpen: false);
        while (true)
        {
            if (!lines.TryReadLine(out var raw, out var terminated))
            {
                yield break;
            }

            if (!terminated)
            {
                truncatedAtLine?.Invoke(lines.LineNumber);
                yield break;
            }

            if (!raw.StartsWith(JournalFormat.EventPrefix)) continue;
            var entry = (EventEntry)JournalLineParser.Parse(raw, lines.LineNumber);
            if (filter.Matches(entry))
            {
                yield return (entry, Encoding.UTF8.GetString(raw));
            }
        }
    }
}
