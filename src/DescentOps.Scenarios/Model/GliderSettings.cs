namespace DescentOps.Scenarios.Model;

/// <summary>
/// A buoyancy glider: net heaviness (or buoyancy) in kg, the glide path angle it trims to, its lift and drag
/// coefficients in the Leonard and Graver (2001) form (kg/m), and the efficiency of its buoyancy pump.
/// </summary>
public sealed record GliderSettings(
    double NetBuoyancyKg,
    double GlideAngleRad,
    double LiftSlopeKgPerMRad,
    double DragOffsetKgPerM,
    double DragQuadraticKgPerMRad2,
    double PumpEfficiency);
