using System.Collections.Immutable;
using DescentOps.Rules.Compiled;
using DescentOps.Rules.Syntax;

namespace DescentOps.Mission.Onboard;

/// <summary>
/// What the on-board rules read, point by point: the limits their comparisons draw on a numeric point (where a verdict
/// can change as the value moves), and whether some check needs every sample of the point (a rate, a step, or a
/// persistence counted in samples), since those depend on the samples themselves and not only on the side of a limit.
/// </summary>
public sealed class OnboardWatch
{
    private OnboardWatch(ImmutableSortedDictionary<string, ImmutableArray<double>> boundaries, ImmutableSortedSet<string> everySample)
    {
        Boundaries = boundaries;
        EverySample = everySample;
    }

    /// <summary>The points the on-board rules read, each with the finite limits of its comparisons (sorted, distinct).</summary>
    public ImmutableSortedDictionary<string, ImmutableArray<double>> Boundaries { get; }

    /// <summary>The points some on-board check needs at every sample.</summary>
    public ImmutableSortedSet<string> EverySample { get; }

    public IEnumerable<string> Points => Boundaries.Keys;

    public bool IsEmpty => Boundaries.IsEmpty;

    public static OnboardWatch From(CompiledRuleSet rules)
    {
        var limits = new SortedDictionary<string, SortedSet<double>>(StringComparer.Ordinal);
        var every = new SortedSet<string>(StringComparer.Ordinal);
        foreach (var leaf in rules.Rules.Where(r => r.Placement == Placement.Board).SelectMany(r => ConditionLeaf.Of(r.Condition)))
        {
            // A check under a time-since or a latch decides with its history: every sample of its points, no limits to cross.
            if (leaf.Check is LimitCondition limit && !leaf.UnderTimeSinceOrLatch)
            {
                var set = Of(limits, limit.Point);
                if (double.IsFinite(limit.Threshold.LowerSi)) set.Add(limit.Threshold.LowerSi);
                if (double.IsFinite(limit.Threshold.UpperSi)) set.Add(limit.Threshold.UpperSi);
                if (leaf.CountedInSamples) every.Add(limit.Point);
                continue;
            }

            foreach (var point in leaf.Check.Points)
            {
                Of(limits, point);
                if (leaf.CountedInSamples || leaf.UnderTimeSinceOrLatch || leaf.Check is not StateCondition) every.Add(point);
            }
        }

        return new OnboardWatch(
            limits.ToImmutableSortedDictionary(p => p.Key, p => p.Value.ToImmutableArray(), StringComparer.Ordinal),
            every.ToImmutableSortedSet(StringComparer.Ordinal));
    }

    private static SortedSet<double> Of(SortedDictionary<string, SortedSet<double>> limits, string point)
    {
        if (!limits.TryGetValue(point, out var set))
        {
            set = [];
            limits[point] = set;
        }

        return set;
    }
}
