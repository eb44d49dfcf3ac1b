using DescentOps.Journal;

namespace DescentOps.Reports.Plotting;

/// <summary>Gathers the points of one <see cref="SeriesDefinition"/> from events as they stream past.</summary>
internal sealed class SeriesCollector(SeriesDefinition definition)
{
    private const double SecondsPerDay = 86_400;
    private readonly List<(string Label, PointBuffer Days, PointBuffer Values)> _lines = [];
    private readonly Dictionary<string, int> _bySource = new(StringComparer.Ordinal);

    /// <summary>
    /// Non-finite values are left out rather than drawn: a plot of a log is no place to hide that a value was NaN,
    /// but the events table and the exports keep them.
    /// </summary>
    public void Add(EventEntry e)
    {
        if (!string.Equals(e.Kind, definition.Kind, StringComparison.Ordinal)) return;
        if (!SeriesExtractor.TryValue(e.Data, definition.Field, out var value) || !double.IsFinite(value)) return;
        var lander = definition.PerLander ? Journal.Querying.EventFilter.LanderOf(e) : null;
        var key = definition.PerSource ? e.Source : lander ?? "";
        if (!_bySource.TryGetValue(key, out var index))
        {
            index = _lines.Count;
            _bySource[key] = index;
            _lines.Add((definition.PerSource ? HumanText.Source(e.Source) : lander is null ? definition.Label : $"{definition.Label} ({lander})", new PointBuffer(), new PointBuffer()));
        }

        _lines[index].Days.Add(e.TimeSeconds / SecondsPerDay);
        _lines[index].Values.Add(value * definition.Scale);
    }

    public IReadOnlyList<PlotSeries> Lines() => _lines.Select(l => new PlotSeries(l.Label, l.Days.ToArray(), l.Values.ToArray())).ToList();
}
