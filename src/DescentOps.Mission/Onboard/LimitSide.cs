namespace DescentOps.Mission.Onboard;

/// <summary>Which side of a limit a value is on: −1 below, 0 on it, +1 above. A limit check's verdict changes only with it.</summary>
public static class LimitSide
{
    public static int Of(double value, double limit) => value > limit ? 1 : value < limit ? -1 : 0;

    /// <summary>Whether two values stand on the same side of every limit.</summary>
    public static bool Same(double a, double b, IReadOnlyList<double> limits)
    {
        foreach (var limit in limits)
        {
            if (Of(a, limit) != Of(b, limit)) return false;
        }

        return true;
    }
}
