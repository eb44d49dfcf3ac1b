namespace DescentOps.Mission.Vehicles;

/// <summary>
/// A vehicle homing on a point in a steady current crabs into the cross-current part and makes good
/// √(v² − c⊥²) + c∥ along the line; zero or less means it cannot get there however long it tries.
/// </summary>
public static class HomingSpeed
{
    public static double ClosingSpeedMPerS(double speedThroughWaterMPerS, OceanVector current, OceanVector towardTarget)
    {
        var distance = towardTarget.Length;
        if (distance <= 0) return speedThroughWaterMPerS;
        var along = towardTarget * (1.0 / distance);
        var parallel = current.Dot(along);
        var across = (current - (along * parallel)).Length;
        if (across >= speedThroughWaterMPerS) return 0.0;
        return Math.Sqrt((speedThroughWaterMPerS * speedThroughWaterMPerS) - (across * across)) + parallel;
    }
}
