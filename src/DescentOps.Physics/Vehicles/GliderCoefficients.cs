namespace DescentOps.Physics.Vehicles;

/// <summary>
/// Lift and drag coefficients of a buoyancy glider in the form of Leonard and Graver (2001): L = (K_L0 + K_L·α)V²,
/// D = (K_D0 + K_D·α²)V², α in radians.
/// </summary>
public sealed record GliderCoefficients(double LiftOffsetKgPerM, double LiftSlopeKgPerMRad, double DragOffsetKgPerM, double DragQuadraticKgPerMRad2)
{
    /// <summary>
    /// A 1.5 m-class glider, K_L0 0, K_L 132.5, K_D0 2.15, K_D 25 (from memory of Graver 2005, "Underwater gliders:
    /// dynamics, control and design", PhD thesis, Princeton).
    /// </summary>
    public static GliderCoefficients Graver2005 { get; } = new(0.0, 132.5, 2.15, 25.0);
}
