namespace DescentOps.Physics.Power;

/// <summary>
/// A turbine in an ocean current: P = ½·ρ·A·C_p·η·v³ between cut-in and rated speed, rated power above it. C_p cannot
/// exceed the Betz limit 16/27 (Betz 1920) for an open rotor.
/// </summary>
public static class CurrentTurbine
{
    /// <summary>Betz limit of an open rotor.</summary>
    public const double BetzLimit = 16.0 / 27.0;

    private const string Model = "the current turbine";

    /// <summary>Electric output at a current speed.</summary>
    public static double ElectricPowerW(double currentSpeedMPerS, double waterDensityKgPerM3, double rotorAreaM2, double powerCoefficient, double drivetrainEfficiency, double cutInSpeedMPerS, double ratedSpeedMPerS)
    {
        ValidRange.RequireNonNegative(currentSpeedMPerS, nameof(currentSpeedMPerS), "m/s", Model);
        ValidRange.Require(waterDensityKgPerM3, 900.0, 1300.0, nameof(waterDensityKgPerM3), "kg/m³", Model);
        ValidRange.RequirePositive(rotorAreaM2, nameof(rotorAreaM2), "m²", Model);
        ValidRange.Require(powerCoefficient, 0.0, BetzLimit, nameof(powerCoefficient), "(power coefficient)", Model);
        ValidRange.Require(drivetrainEfficiency, 0.0, 1.0, nameof(drivetrainEfficiency), "(fraction)", Model);
        ValidRange.RequireNonNegative(cutInSpeedMPerS, nameof(cutInSpeedMPerS), "m/s", Model);
        ValidRange.Require(ratedSpeedMPerS, cutInSpeedMPerS, double.MaxValue, nameof(ratedSpeedMPerS), "m/s", Model);
        if (currentSpeedMPerS < cutInSpeedMPerS) return 0.0;
        var v = Math.Min(currentSpeedMPerS, ratedSpeedMPerS);
        return 0.5 * waterDensityKgPerM3 * rotorAreaM2 * powerCoefficient * drivetrainEfficiency * v * v * v;
    }
}
