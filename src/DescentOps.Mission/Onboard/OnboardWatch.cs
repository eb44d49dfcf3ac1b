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
        foreach (var rule in rules.Rules.Where(r => r.Placement == Placement.Board))
        {
            Collect(rule.Condition, false, limits, every);
        }

        return new OnboardWatch(
            limits.ToImmutableSortedDictionary(p => p.Key, p => p.Value.ToImmutableArray(), StringComparer.Ordinal),
            every.ToImmutableSortedSet(StringComparer.Ordinal));
    }

    private static void Collect(CompiledCondition condition, bool counted, SortedDictionary<string, SortedSet<double>> limits, SortedSet<string> every)
    {
        switch (condition)
        {
            case AllOfCondition all:
                foreach (var operand in all.Operands) Collect(operand, counted, limits, every);
                break;
            case AnyOfCondition any:
                foreach (var operand in any.Operands) Collect(operand, counted, limits, every);
                break;
            case NotCondition not:
                Collect(not.Operand, counted, limits, every);
                break;
            case HoldsForDurationCondition duration:
                Collect(duration.Operand, counted, limits, every);
                break;
            case HoldsForSamplesCondition samples:
                Collect(samples.Operand, true, limits, every);
                break;
            case LimitCondition limit:
                var set = Of(limits, limit.Point);
                if (double.IsFinite(limit.Threshold.LowerSi)) set.Add(limit.Threshold.LowerSi);
                if (double.IsFinite(limit.Threshold.UpperSi)) set.Add(limit.Threshold.UpperSi);
                if (counted) every.Add(limit.Point);
                break;
            default:
                foreach (var point in condition.Points)
                {
                    Of(limits, point);
                    if (counted || condition is not StateCondition) every.Add(point);
                }

                break;
        }
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
