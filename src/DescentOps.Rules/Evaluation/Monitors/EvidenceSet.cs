namespace DescentOps.Rules.Evaluation.Monitors;

/// <summary>
/// Merges evidence lists: each sample once, oldest first (ties keep first-seen order), at most
/// <see cref="MaxSamples"/> of the newest, so a long persistence period cannot grow a firing without bound.
/// </summary>
internal static class EvidenceSet
{
    public const int MaxSamples = 64;

    /// <summary>Up to this many samples are merged by linear scans and an insertion sort, which allocate nothing extra.</summary>
    private const int SmallMerge = 16;

    public static IReadOnlyList<TelemetrySample> Union(IEnumerable<IReadOnlyList<TelemetrySample>> lists)
    {
        var all = lists as IReadOnlyList<IReadOnlyList<TelemetrySample>> ?? [.. lists];
        var total = 0;
        foreach (var list in all) total += list.Count;
        if (total == 0) return [];
        return total <= SmallMerge ? SmallUnion(all, total) : LargeUnion(all);
    }

    /// <summary>
    /// The common case (a comparison's one or two samples, a combination of a few): rules evaluate on every sample, and
    /// a hash set plus a sort per evaluation made evidence the largest cost of a rule (rules benchmark).
    /// </summary>
    private static TelemetrySample[] SmallUnion(IReadOnlyList<IReadOnlyList<TelemetrySample>> lists, int total)
    {
        var merged = new TelemetrySample[total];
        var count = 0;
        foreach (var list in lists)
        {
            foreach (var sample in list)
            {
                var seen = false;
                for (var i = 0; i < count && !seen; i++) seen = ReferenceEquals(merged[i], sample);
                if (seen) continue;

                // Insertion keeps first-seen order among equal times: the new sample goes after every one not later.
                var at = count;
                while (at > 0 && merged[at - 1].Time > sample.Time)
                {
                    merged[at] = merged[at - 1];
                    at--;
                }

                merged[at] = sample;
                count++;
            }
        }

        return count == total ? merged : merged[..count];
    }

    private static List<TelemetrySample> LargeUnion(IReadOnlyList<IReadOnlyList<TelemetrySample>> lists)
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
