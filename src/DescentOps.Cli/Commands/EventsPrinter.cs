using System.Globalization;
using DescentOps.Cli.Output;
using DescentOps.Records;
using DescentOps.Journal;
using DescentOps.Journal.Querying;

namespace DescentOps.Cli.Commands;

/// <summary>
/// Prints the events of a log that pass a filter, as a table, the original JSON lines, or CLEF. It stops reading
/// as soon as the reader of its output has gone, and when nothing matches it says which kinds and sources the log
/// does hold.
/// </summary>
public static class EventsPrinter
{
    public enum Format
    {
        Table,
        Jsonl,
        Clef,
    }

    /// <summary>What was printed: the events, whether the reader closed the output early, and where the log was cut.</summary>
    public sealed record Result(long Printed, bool ReaderGone, long? TruncatedAtLine);

    public static Result Print(string path, EventFilter filter, Format format, TextWriter output, TextWriter notes, DateTimeOffset epoch, bool noteTruncation = true)
    {
        ArgumentNullException.ThrowIfNull(filter);
        ArgumentNullException.ThrowIfNull(output);
        ArgumentNullException.ThrowIfNull(notes);
        long? truncated = null;
        long count = 0;
        try
        {
            if (format == Format.Table) output.WriteLine($"{"time (d)",12}  {"source",-18} {"kind",-24} {"severity",-8}  data");
            foreach (var (entry, line) in JournalQuery.Events(path, filter, at => truncated = at))
            {
                count++;
                output.WriteLine(format switch
                {
                    Format.Table => Row(entry),
                    Format.Clef => ClefLine.Format(entry, epoch),
                    _ => line,
                });
            }

            if (format == Format.Table) output.WriteLine($"{count} events");
            output.Flush();
        }
        catch (IOException exception) when (StandardOutput.IsClosedPipe(exception))
        {
            return new Result(count, ReaderGone: true, truncated);
        }

        if (noteTruncation && truncated is { } cut) notes.WriteLine($"note: the log is truncated at line {cut}; events up to its last intact line are shown.");
        if (count == 0 && (filter.Kinds.Count > 0 || filter.Sources.Count > 0 || filter.Landers.Count > 0)) notes.WriteLine(WhatExists(path, filter));
        return new Result(count, ReaderGone: false, truncated);
    }

    /// <summary>For a filter that matched nothing: the kinds and sources the log holds, with their counts.</summary>
    public static string WhatExists(string path, EventFilter filter)
    {
        ArgumentNullException.ThrowIfNull(filter);
        var kinds = new SortedDictionary<string, long>(StringComparer.Ordinal);
        var sources = new SortedDictionary<string, long>(StringComparer.Ordinal);
        var landers = new SortedDictionary<string, long>(StringComparer.Ordinal);
        foreach (var (entry, _) in JournalQuery.Events(path, EventFilter.All))
        {
            if (EventFilter.LanderOf(entry) is { } lander) landers[lander] = landers.GetValueOrDefault(lander) + 1;
            kinds[entry.Kind] = kinds.GetValueOrDefault(entry.Kind) + 1;
            sources[entry.Source] = sources.GetValueOrDefault(entry.Source) + 1;
        }

        var lines = new List<string>();
        if (filter.Kinds.Count > 0 && !filter.Kinds.Any(k => kinds.Keys.Any(known => new EventFilter([k], []).MatchesKind(known))))
        {
            lines.Add($"note: no event of kind {string.Join(", ", filter.Kinds)} in this log; its kinds are: {List(kinds)}");
        }

        if (filter.Sources.Count > 0 && !filter.Sources.Any(s => sources.Keys.Any(known => new EventFilter([], [s]).MatchesSource(known))))
        {
            lines.Add($"note: no event from source {string.Join(", ", filter.Sources)} in this log; its sources are: {List(sources)}");
        }

        if (filter.Landers.Count > 0 && !filter.Landers.Any(landers.ContainsKey))
        {
            lines.Add(landers.Count == 0
                ? $"note: no event of lander {string.Join(", ", filter.Landers)}: this run has no landers"
                : $"note: no event of lander {string.Join(", ", filter.Landers)} in this log; its landers are: {List(landers)}");
        }

        if (lines.Count == 0)
        {
            lines.Add("note: no event passes all the filters together (each matches some events on its own); widen the time window or the severity.");
        }

        return string.Join(Environment.NewLine, lines);
    }

    private static string List(SortedDictionary<string, long> counts) =>
        string.Join(", ", counts.Select(p => string.Create(CultureInfo.InvariantCulture, $"{p.Key} ({p.Value})")));

    private static string Row(EventEntry e)
    {
        var data = string.Join(" ", e.Data.Select(f => f.Kind == RecordFieldKind.Number
            ? string.Create(CultureInfo.InvariantCulture, $"{f.Name}={f.Number:G6}")
            : f.ToString()));
        return string.Create(CultureInfo.InvariantCulture, $"{e.TimeSeconds / 86400,12:F6}  {e.Source,-18} {e.Kind,-24} {e.Severity.ToString().ToLowerInvariant(),-8}  {data}");
    }
}
