namespace DescentOps.Rules.Evaluation.Monitors;

/// <summary>
/// Merges evidence lists: each sample once, oldest first (ties keep first-seen order), at most
/// <see cref="MaxSamples"/> of the newest, so a long persistence period cannot grow a firing without bound.
/// </summary>
internal static class EvidenceSet
{
    public const int MaxSamples = 64;

    public static IReadOnlyList<TelemetrySample> Union(IEnumerable<IReadOnlyList<TelemetrySample>> lists)
    {
        var seen = new HashSet<TelemetrySample>(ReferenceEqualityComparer.Instance);
        var merged = new List<TelemetrySample>();
        foreach (var list in lists)
        {
            foreach (var sample in list)
            {
                if (seen.Add(sample))
                {
                    merged.Add(sample);
                }
            }
        }

        var ordered = merged.OrderBy(s => s.Time).ToList();
        return ordered.Count > MaxSamples ? ordered.GetRange(ordered.Count - MaxSamples, MaxSamples) : ordered;
    }
}
