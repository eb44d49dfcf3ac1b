namespace DescentOps.Physics.Descent;

/// <summary>
/// The slow-speed limit of a heat source in cold ice (after Lorenz 2012, Astrobiology 12, 799; his equation was not
/// seen, this is our reconstruction, MODEL): a body whose surface is held at T_m loses, at rest, the steady
/// conduction C·Φ(T∞, T_m), C its electrostatic capacitance (4πR for a sphere). A source that cannot supply it
/// does not reach T_m and stalls. For k = a/T the steady surface temperature of a source P is T∞·exp(P/(C a)).
/// </summary>
public static class StallLimit
{
    /// <summary>Capacitance of a sphere, 4πR.</summary>
    public static double SphereCapacitanceM(double radiusM) =>
        4.0 * Math.PI * ValidRange.RequirePositive(radiusM, nameof(radiusM), "m", "the stall limit");

    /// <summary>
    /// Capacitance of a prolate spheroid with semi-axes a ≥ b, 4π√(a²−b²)/ln((a+√(a²−b²))/b); for a cylinder of
    /// length ℓ and radius R we take a = ℓ/2, b = R (MODEL). A probe not longer than its diameter is taken as a sphere.
    /// </summary>
    public static double ProbeCapacitanceM(double radiusM, double lengthM)
    {
        ValidRange.RequirePositive(radiusM, nameof(radiusM), "m", "the stall limit");
        ValidRange.RequirePositive(lengthM, nameof(lengthM), "m", "the stall limit");
        var a = lengthM / 2.0;
        var b = radiusM;
        if (a <= b * (1 + 1e-9)) return SphereCapacitanceM(Math.Max(a, b));
        var e = Math.Sqrt((a * a) - (b * b));
        return 4.0 * Math.PI * e / Math.Log((a + e) / b);
    }

    /// <summary>Power a body of capacitance C needs to hold its surface at T_m: P_stall = C Φ.</summary>
    public static double StallPowerW(double capacitanceM, double kirchhoffPotentialWPerM) =>
        ValidRange.RequirePositive(capacitanceM, nameof(capacitanceM), "m", "the stall limit")
        * ValidRange.RequireNonNegative(kirchhoffPotentialWPerM, nameof(kirchhoffPotentialWPerM), "W/m", "the stall limit");

    /// <summary>Steady surface temperature of a source of power P at rest in ice with k = a/T.</summary>
    public static double SteadySurfaceTemperatureK(double powerW, double capacitanceM, double farFieldTemperatureK, double conductivityCoefficientWPerM = Ice.IceConductivity.ReciprocalCoefficientWPerM)
    {
        ValidRange.RequireNonNegative(powerW, nameof(powerW), "W", "the stall limit");
        ValidRange.RequirePositive(capacitanceM, nameof(capacitanceM), "m", "the stall limit");
        ValidRange.RequirePositive(farFieldTemperatureK, nameof(farFieldTemperatureK), "K", "the stall limit");
        return farFieldTemperatureK * Math.Exp(powerW / (capacitanceM * conductivityCoefficientWPerM));
    }
}
