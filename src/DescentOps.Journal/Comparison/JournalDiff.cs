using System.Text;
using DescentOps.Records;

namespace DescentOps.Journal.Comparison;

/// <summary>
/// What separates two runs: the first event that differs (by content: chain values always differ once
/// the manifests do), the outcome and summary figures side by side, and the events one run has more of,
/// counted by kind and, for faults and rule firings, by name.
/// </summary>
public sealed record JournalDiff(
    JournalDivergence? FirstEventDivergence,
    SummaryEntry? SummaryA,
    SummaryEntry? SummaryB,
    IReadOnlyList<(string Key, long CountA, long CountB)> CountDifferences)
{
    /// <summary>Data fields that name which fault or rule an event is about.</summary>
    private static readonly string[] NameFields = ["fault", "rule"];

    public bool Identical =>
        FirstEventDivergence is null && CountDifferences.Count == 0 && SameSummary(SummaryA, SummaryB);

    /// <summary>
    /// Reads both logs once, side by side, in constant memory (the first divergence and the event counts are all it
    /// keeps), so a year-long log is compared at disk speed without holding either in memory.
    /// </summary>
    /// <param name="pathA">The first log.</param>
    /// <param name="pathB">The second log.</param>
    /// <param name="progress">Called now and then with the share of both files read so far (0 to 1).</param>
    public static JournalDiff Compare(string pathA, string pathB, Action<double>? progress = null)
    {
        using var fileA = Utf8LineSource.OpenFile(pathA);
        using var fileB = Utf8LineSource.OpenFile(pathB);
        var total = Math.Max(1.0, fileA.Length + fileB.Length);
        using var readerA = new JournalReader(fileA, leaveOpen: true);
        using var readerB = new JournalReader(fileB, leaveOpen: true);
        var a = new Side(readerA);
        var b = new Side(readerB);
        JournalDivergence? divergence = null;
        long step = 0;
        while (true)
        {
            var eventA = a.NextEvent();
            var eventB = b.NextEvent();
            if (eventA is null && eventB is null) break;
            if (divergence is null)
            {
                var contentA = eventA is null ? null : Content(eventA);
                var contentB = eventB is null ? null : Content(eventB);
                if (contentA != contentB)
                {
                    divergence = new JournalDivergence(eventA?.LineNumber ?? eventB!.LineNumber, eventA?.TimeSeconds, eventB?.TimeSeconds, contentA, contentB);
                }
            }

            if (progress is not null && ++step % 65536 == 0) progress((fileA.Position + fileB.Position) / total);
        }

        var keys = a.Counts.Keys.Union(b.Counts.Keys).Order(StringComparer.Ordinal);
        var differences = keys
            .Select(k => (Key: k, CountA: a.Counts.GetValueOrDefault(k), CountB: b.Counts.GetValueOrDefault(k)))
            .Where(d => d.CountA != d.CountB)
            .ToList();
        return new JournalDiff(divergence, a.Summary, b.Summary, differences);
    }

    /// <summary>Field by field: the record's own equality would compare the data lists by reference.</summary>
    private static bool SameSummary(SummaryEntry? a, SummaryEntry? b) =>
        a is null || b is null
            ? a is null && b is null
            : a.Summary.OutcomeKind == b.Summary.OutcomeKind
              && a.Summary.Reason == b.Summary.Reason
              && a.Summary.FinalTimeS.Equals(b.Summary.FinalTimeS)
              && a.Summary.Data.Select(f => f.ToString()).SequenceEqual(b.Summary.Data.Select(f => f.ToString()));

    private static void Count(Dictionary<string, long> counts, string key) => counts[key] = counts.GetValueOrDefault(key) + 1;

    /// <summary>An event as text without its line-bound parts (chain), so equal events compare equal.</summary>
    private static string Content(EventEntry e)
    {
        var text = new StringBuilder();
        text.Append(e.Sequence).Append(' ').Append(e.TimeSeconds.ToString("R", System.Globalization.CultureInfo.InvariantCulture))
            .Append(' ').Append(e.Source).Append(' ').Append(e.Kind).Append(' ').Append(e.Severity);
        foreach (var field in e.Data) text.Append(' ').Append(field.ToString());
        return text.ToString();
    }

    /// <summary>One log being read: its events one at a time, counted by kind and name as they pass.</summary>
    private sealed class Side(JournalReader reader)
    {
        public Dictionary<string, long> Counts { get; } = new(StringComparer.Ordinal);

        public SummaryEntry? Summary { get; private set; }

        /// <summary>The next event, or null at the end (a summary is kept on the way).</summary>
        public EventEntry? NextEvent()
        {
            while (reader.TryRead(out var entry))
            {
                switch (entry)
                {
                    case EventEntry e:
                        JournalDiff.Count(Counts, e.Kind);
                        foreach (var field in e.Data)
                        {
                            if (field.Kind == RecordFieldKind.Text && NameFields.Contains(field.Name)) JournalDiff.Count(Counts, $"{e.Kind} {field.Name}={field.Text}");
                        }

                        return e;
                    case SummaryEntry s:
                        Summary = s;
                        break;
                }
            }

            return null;
        }
    }
}
