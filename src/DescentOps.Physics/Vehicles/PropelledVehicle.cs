namespace DescentOps.Physics.Vehicles;

/// <summary>
/// A propeller-driven vehicle: D = ½ρC_D·A·V², propulsive power D·V/η, plus a constant hotel load. Energy per distance
/// is P/V, which has a minimum where the propulsive power is half the hotel load.
/// </summary>
/// <param name="DragCoefficient">On frontal area (0.2, RULE).</param>
/// <param name="FrontalAreaM2">π·0.1² for a 0.2 m hull.</param>
/// <param name="PropulsiveEfficiency">Propeller and motor together (0.5, RULE).</param>
/// <param name="HotelPowerW">Everything but propulsion (20 W, RULE).</param>
public sealed record PropelledVehicle(double DragCoefficient, double FrontalAreaM2, double PropulsiveEfficiency, double HotelPowerW)
{
    /// <summary>The note's defaults: C_D 0.2, 0.2 m diameter, η 0.5, 20 W hotel.</summary>
    public static PropelledVehicle Default { get; } = new(0.2, Math.PI * 0.1 * 0.1, 0.5, 20.0);
}
