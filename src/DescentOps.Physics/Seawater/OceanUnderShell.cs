namespace DescentOps.Physics.Seawater;

/// <summary>
/// The water just under an ice shell, by TEOS-10: at the ocean's Absolute Salinity and the pressure the shell exerts,
/// at its freezing point unless a warmer temperature is given (colder is refused with the range). The sea pressure is
/// the absolute pressure less one standard atmosphere; under a shell too thin to exert one atmosphere on an airless
/// body it is taken as 0, the bottom of TEOS-10's range (the difference is under 0.1 MPa: 7 mK of freezing point).
/// </summary>
public sealed record OceanUnderShell(SeawaterState Water, double GravityMPerS2)
{
    public static OceanUnderShell At(double absoluteSalinityGPerKg, double absolutePressurePa, double gravityMPerS2, double? temperatureK = null)
    {
        var seaPressure = SeaPressurePa(absolutePressurePa);
        var water = temperatureK is { } t
            ? Teos10Seawater.At(absoluteSalinityGPerKg, seaPressure, t)
            : Teos10Seawater.AtFreezing(absoluteSalinityGPerKg, seaPressure);
        return new OceanUnderShell(water, gravityMPerS2);
    }

    /// <summary>Sea pressure under an absolute pressure: less one atmosphere, never below 0.</summary>
    public static double SeaPressurePa(double absolutePressurePa) => Math.Max(0.0, absolutePressurePa - SeawaterGibbsFunction.StandardAtmospherePa);

    public double TemperatureK => Water.TemperatureK;

    public double DensityKgPerM3 => Water.DensityKgPerM3;

    public double SoundSpeedMPerS => Water.SoundSpeedMPerS;

    /// <summary>
    /// Sea pressure at a depth below the shell in a column of the same salinity and Conservative Temperature,
    /// integrating dp/dz = ρ g with TEOS-10 density (midpoint rule in 16 steps: density changes by under 1 % over the
    /// whole column, so the rule's error is far below a part in a million). Refused beyond TEOS-10's 100 MPa.
    /// </summary>
    public double SeaPressureBelowPa(double depthBelowShellM)
    {
        ValidRange.RequireNonNegative(depthBelowShellM, nameof(depthBelowShellM), "m", "the ocean column under the shell");
        const int steps = 16;
        var h = depthBelowShellM / steps;
        var p = Water.SeaPressurePa;
        for (var i = 0; i < steps; i++)
        {
            var mid = p + (0.5 * h * Density(p) * GravityMPerS2);
            p += h * Density(mid) * GravityMPerS2;
        }

        return Teos10Seawater.Pressure.Require(p);
    }

    private double Density(double seaPressurePa)
    {
        Teos10Seawater.Pressure.Require(seaPressurePa);
        var t = ConservativeTemperature.ToInSituK(Water.AbsoluteSalinityGPerKg, Water.ConservativeTemperatureK, seaPressurePa);
        return SeawaterGibbsFunction.Evaluate(Water.AbsoluteSalinityGPerKg, t, seaPressurePa).DensityKgPerM3;
    }
}
