using MathNet.Numerics.RootFinding;

namespace DescentOps.Mission.Onboard;

/// <summary>
/// The first instant, in whole ticks, at which a value that moves smoothly between events stands on the other side of a
/// limit. Brent's bracketing method (MathNet) finds the root of value − limit on the bracket; the answer is then settled
/// on the tick grid so that the value at the returned tick is past the limit and the value one tick earlier is not. The
/// value is assumed monotone over the bracket (true of every closed-form point between two events: depth, tilt, charge
/// and energy are linear in time, the ice temperature is a monotone function of depth, the buffer fill is constant).
/// </summary>
public static class CrossingFinder
{
    /// <summary>Tick walks longer than this fall back to bisection on ticks (a root estimate that far off means a flat stretch).</summary>
    private const int MaxWalk = 64;

    /// <summary>
    /// The first tick in (<paramref name="fromTick"/>, <paramref name="toTick"/>] whose value is on another side of
    /// <paramref name="limit"/> than the value at <paramref name="fromTick"/>; null when the end of the bracket is on
    /// the same side.
    /// </summary>
    public static long? FirstTickPast(Func<long, double> valueAt, long fromTick, long toTick, double limit)
    {
        if (toTick <= fromTick) return null;
        var startSide = LimitSide.Of(valueAt(fromTick), limit);
        if (LimitSide.Of(valueAt(toTick), limit) == startSide) return null;
        bool Past(long tick) => LimitSide.Of(valueAt(tick), limit) != startSide;

        var guess = toTick;
        if (startSide != 0 && Brent.TryFindRoot(x => valueAt((long)Math.Floor(x)) - limit, fromTick, toTick, 0.5, 200, out var root))
        {
            guess = Math.Clamp((long)Math.Floor(root), fromTick + 1, toTick);
        }

        for (var walk = 0; walk < MaxWalk; walk++)
        {
            var past = Past(guess);
            if (past && (guess - 1 <= fromTick || !Past(guess - 1))) return guess;
            guess = past ? guess - 1 : guess + 1;
            if (guess > toTick) return toTick;
        }

        // Bisection on ticks: the predicate is false at fromTick and true at toTick.
        long lo = fromTick, hi = toTick;
        while (hi - lo > 1)
        {
            var mid = lo + ((hi - lo) / 2);
            if (Past(mid)) hi = mid;
            else lo = mid;
        }

        return hi;
    }
}
