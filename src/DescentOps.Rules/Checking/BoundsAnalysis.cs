using DescentOps.Rules.Catalogue;
using DescentOps.Rules.Compiled;
using DescentOps.Rules.Syntax;

namespace DescentOps.Rules.Checking;

/// <summary>
/// Finds conditions no telemetry can satisfy: bounds on one point that exclude each other or the point's
/// physical range within a conjunction, or states that cannot both hold. It is sound but not complete: it only
/// claims "never" when that is certain, and does not look inside 'not', rate or step checks.
/// </summary>
internal static class BoundsAnalysis
{
    public static bool CanNeverHold(CompiledCondition condition, TelemetryCatalogue catalogue) => condition switch
    {
        AnyOfCondition any => any.Operands.All(o => CanNeverHold(o, catalogue)),
        AllOfCondition or LimitCondition or StateCondition or HoldsForDurationCondition or HoldsForSamplesCondition =>
            ConjunctionIsEmpty(condition, catalogue),
        _ => false,
    };

    private static bool ConjunctionIsEmpty(CompiledCondition condition, TelemetryCatalogue catalogue)
    {
        var conjuncts = new List<CompiledCondition>();
        Flatten(condition, conjuncts);
        if (conjuncts.Any(c => c is AnyOfCondition && CanNeverHold(c, catalogue)))
        {
            return true;
        }

        foreach (var group in conjuncts.OfType<LimitCondition>().GroupBy(l => l.Point, StringComparer.Ordinal))
        {
            if (catalogue.FindPoint(group.Key) is not NumericPointSpec spec)
            {
                continue;
            }

            var interval = new Interval(spec.MinimumSi, false, spec.MaximumSi, false);
            foreach (var limit in group)
            {
                interval = limit.Threshold.Kind switch
                {
                    Comparison.Above => interval.Intersect(new Interval(limit.Threshold.LowerSi, true, double.PositiveInfinity, true)),
                    Comparison.Below => interval.Intersect(new Interval(double.NegativeInfinity, true, limit.Threshold.UpperSi, true)),
                    Comparison.Inside => interval.Intersect(new Interval(limit.Threshold.LowerSi, false, limit.Threshold.UpperSi, false)),
                    _ => interval,
                };
            }

            if (interval.IsEmpty)
            {
                return true;
            }
        }

        foreach (var group in conjuncts.OfType<StateCondition>().GroupBy(s => s.Point, StringComparer.Ordinal))
        {
            var required = group.Where(s => !s.Negated).Select(s => s.Value).Distinct(StringComparer.Ordinal).ToArray();
            var excluded = group.Where(s => s.Negated).Select(s => s.Value).ToHashSet(StringComparer.Ordinal);
            if (required.Length > 1 || required.Any(excluded.Contains))
            {
                return true;
            }

            if (catalogue.FindPoint(group.Key) is DiscretePointSpec spec && spec.Values.All(excluded.Contains))
            {
                return true;
            }
        }

        return false;
    }

    /// <summary>Persistence does not change which values satisfy a condition, only when, so it is looked through.</summary>
    private static void Flatten(CompiledCondition condition, List<CompiledCondition> into)
    {
        switch (condition)
        {
            case AllOfCondition all:
                foreach (var operand in all.Operands)
                {
                    Flatten(operand, into);
                }

                break;
            case HoldsForDurationCondition duration:
                Flatten(duration.Operand, into);
                break;
            case HoldsForSamplesCondition samples:
                Flatten(samples.Operand, into);
                break;
            default:
                into.Add(condition);
                break;
        }
    }

    private readonly record struct Interval(double Lower, bool LowerOpen, double Upper, bool UpperOpen)
    {
        public bool IsEmpty => Lower > Upper || (Lower == Upper && (LowerOpen || UpperOpen));

        public Interval Intersect(Interval other)
        {
            var (lower, lowerOpen) = Lower > other.Lower ? (Lower, LowerOpen)
                : other.Lower > Lower ? (other.Lower, other.LowerOpen)
                : (Lower, LowerOpen || other.LowerOpen);
            var (upper, upperOpen) = Upper < other.Upper ? (Upper, UpperOpen)
                : other.Upper < Upper ? (other.Upper, other.UpperOpen)
                : (Upper, UpperOpen || other.UpperOpen);
            return new Interval(lower, lowerOpen, upper, upperOpen);
        }
    }
}
