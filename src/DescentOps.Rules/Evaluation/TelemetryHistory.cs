namespace DescentOps.Rules.Evaluation;

/// <summary>
/// Recent samples per point: enough for the longest rate window on the point (plus the sample just before it)
/// and always the last two, for step checks.
/// </summary>
internal sealed class TelemetryHistory
{
    private readonly Dictionary<string, List<TelemetrySample>> _samples = new(StringComparer.Ordinal);
    private readonly IReadOnlyDictionary<string, long> _retentionTicks;

    public TelemetryHistory(IReadOnlyDictionary<string, long> retentionTicks)
    {
        _retentionTicks = retentionTicks;
    }

    public void Add(TelemetrySample sample)
    {
        if (!_samples.TryGetValue(sample.Point, out var list))
        {
            list = [];
            _samples[sample.Point] = list;
        }

        list.Add(sample);
        var retention = _retentionTicks.GetValueOrDefault(sample.Point);
        var dropped = 0;
        while (list.Count - dropped > 2 && sample.Time.Ticks - list[dropped + 1].Time.Ticks >= retention)
        {
            dropped++;
        }

        list.RemoveRange(0, dropped);
    }

    /// <summary>Oldest first; empty when the point has not been sampled.</summary>
    public IReadOnlyList<TelemetrySample> Of(string point) =>
        _samples.TryGetValue(point, out var list) ? list : [];
}
