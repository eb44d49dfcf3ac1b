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

    public static JournalDiff Compare(string pathA, string pathB)
    {
        var a = Load(pathA);
        var b = Load(pathB);
        JournalDivergence? divergence = null;
        for (var i = 0; i < Math.Max(a.Events.Count, b.Events.Count) && divergence is null; i++)
        {
            var lineA = i < a.Events.Count ? a.Events[i] : default;
            var lineB = i < b.Events.Count ? b.Events[i] : default;
            if (lineA.Content != lineB.Content)
            {
                divergence = new JournalDivergence(lineA.Entry?.LineNumber ?? lineB.Entry!.LineNumber, lineA.Entry?.TimeSeconds, lineB.Entry?.TimeSeconds, lineA.Content, lineB.Content);
            }
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

    private static Loaded Load(string path)
    {
        var events = new List<(EventEntry? Entry, string? Content)>();
        var counts = new Dictionary<string, long>(StringComparer.Ordinal);
        SummaryEntry? summary = null;
        using var reader = JournalReader.Open(path);
        foreach (var entry in reader.ReadAll())
        {
            switch (entry)
            {
                case EventEntry e:
                    events.Add((e, Content(e)));
                    Count(counts, e.Kind);
                    foreach (var field in e.Data)
                    {
                        if (field.Kind == RecordFieldKind.Text && NameFields.Contains(field.Name)) Count(counts, $"{e.Kind} {field.Name}={field.Text}");
                    }

                    break;
                case SummaryEntry s:
                    summary = s;
                    break;
            }
        }

        return new Loaded(events, counts, summary);
    }

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

    private sealed record Loaded(List<(EventEntry? Entry, string? Content)> Events, Dictionary<string, long> Counts, SummaryEntry? Summary);
}
