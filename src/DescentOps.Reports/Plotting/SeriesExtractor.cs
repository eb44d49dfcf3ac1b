using DescentOps.Records;

namespace DescentOps.Reports.Plotting;

/// <summary>Pulls the points of a <see cref="SeriesDefinition"/> out of a log's events.</summary>
public static class SeriesExtractor
{
    private const double SecondsPerDay = 86_400;

    /// <summary>
    /// The lines for one definition: one, or one per source in order of first appearance. Non-finite values are
    /// left out rather than drawn as gaps: a plot of a log is no place to hide that a value was NaN, but the
    /// events table and the exports keep them.
    /// </summary>
    public static IReadOnlyList<PlotSeries> Extract(RunLog log, SeriesDefinition definition)
    {
        ArgumentNullException.ThrowIfNull(log);
        ArgumentNullException.ThrowIfNull(definition);
        var lines = new List<(string Label, List<double> Days, List<double> Values)>();
        var bySource = new Dictionary<string, int>(StringComparer.Ordinal);
        foreach (var e in log.Events)
        {
            if (!string.Equals(e.Kind, definition.Kind, StringComparison.Ordinal)) continue;
            if (!TryValue(e.Data, definition.Field, out var value) || !double.IsFinite(value)) continue;
            var key = definition.PerSource ? e.Source : "";
            if (!bySource.TryGetValue(key, out var index))
            {
                index = lines.Count;
                bySource[key] = index;
                lines.Add((definition.PerSource ? e.Source : definition.Label, [], []));
            }

            lines[index].Days.Add(e.TimeSeconds / SecondsPerDay);
            lines[index].Values.Add(value * definition.Scale);
        }

        return lines.Select(l => new PlotSeries(l.Label, [.. l.Days], [.. l.Values])).ToList();
    }

    /// <summary>A field's value as a double, for numbers and integers alike.</summary>
    public static bool TryValue(IReadOnlyList<RecordField> data, string field, out double value)
    {
        ArgumentNullException.ThrowIfNull(data);
        foreach (var f in data)
        {
            if (!string.Equals(f.Name, field, StringComparison.Ordinal)) continue;
            switch (f.Kind)
            {
                case RecordFieldKind.Number: value = f.Number; return true;
                case RecordFieldKind.Integer: value = f.Integer; return true;
            }
        }

        value = 0;
        return false;
    }
}
