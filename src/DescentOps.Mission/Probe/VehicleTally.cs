namespace DescentOps.Mission.Probe;

/// <summary>The run's closing sentence about its vehicles, with the number and its noun agreeing.</summary>
public static class VehicleTally
{
    /// <summary>Why the run ended once every vehicle finished or was lost.</summary>
    public static string Reason(int finished, int lost)
    {
        ArgumentOutOfRangeException.ThrowIfNegative(finished);
        ArgumentOutOfRangeException.ThrowIfNegative(lost);
        if (finished == 0) return lost == 1 ? "the vehicle was lost" : $"all {lost} vehicles lost";
        if (lost > 0) return $"{Count(finished)} finished {(finished == 1 ? "its task" : "their tasks")}, {lost} lost";
        return finished == 1 ? "the vehicle finished its task" : $"all {finished} vehicles finished their tasks";
    }

    /// <summary><c>1 vehicle</c>, <c>2 vehicles</c>.</summary>
    public static string Count(long n) => n == 1 ? "1 vehicle" : $"{n} vehicles";
}
