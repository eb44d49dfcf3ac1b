namespace DescentOps.Scenarios.Model;

/// <summary>
/// How often the probe's on-board software reads each of its sensors, apart from the telemetry frames it sends home.
/// <see cref="IntervalS"/> applies to every point no entry names (null: the telemetry interval); an entry naming a point
/// wins over one naming its group. With <see cref="ExactCrossings"/>, a limit check on a point whose value between
/// events the physics gives in closed form is evaluated at the instant the limit is crossed, not at the next sample.
/// </summary>
public sealed record OnboardSamplingModel(double? IntervalS, bool ExactCrossings, IReadOnlyList<(string Name, double IntervalS)> Entries)
{
    /// <summary>The sampling interval of <paramref name="point"/>, in seconds.</summary>
    public double IntervalOf(string point, double frameIntervalS)
    {
        foreach (var (name, interval) in Entries)
        {
            if (name == point) return interval;
        }

        var group = OnboardSamplingGroups.GroupOf(point);
        foreach (var (name, interval) in Entries)
        {
            if (name == group) return interval;
        }

        return IntervalS ?? frameIntervalS;
    }
}
