using DescentOps.Physics.Ice;

namespace DescentOps.Physics.Shell;

/// <summary>
/// Pressure with depth in an ice shell, dp/dz = ρ_i(T(z), p) g, with surface gravity a parameter held constant
/// through the shell (RULE: error below 1 % while the shell is thin against the body's radius).
/// </summary>
public static class HydrostaticPressure
{
    /// <summary>Default number of integration steps (the reference note's check values use 2000).</summary>
    public const int DefaultSteps = 2000;

    /// <summary>
    /// Integrates from the surface with the explicit midpoint rule; density from IAPWS R10-06. Returns the pressure
    /// at every step boundary (index i at depth i·D/n), so callers can interpolate without integrating again.
    /// </summary>
    public static double[] Profile(Func<double, double> temperatureAtDepthK, double depthM, double gravityMPerS2, double surfacePressurePa, int steps = DefaultSteps)
    {
        ArgumentNullException.ThrowIfNull(temperatureAtDepthK);
        ValidRange.RequireNonNegative(depthM, nameof(depthM), "m", "the hydrostatic pressure integral");
        ValidRange.RequirePositive(gravityMPerS2, nameof(gravityMPerS2), "m/s²", "the hydrostatic pressure integral");
        ValidRange.Require(surfacePressurePa, 0.0, IceGibbsFunction.MaximumPressurePa, nameof(surfacePressurePa), "Pa", "the hydrostatic pressure integral");
        if (steps < 1) throw new ArgumentOutOfRangeException(nameof(steps), steps, "steps must be at least 1.");

        var dz = depthM / steps;
        var p = new double[steps + 1];
        p[0] = surfacePressurePa;
        for (var i = 0; i < steps; i++)
        {
            var z = i * dz;
            var half = p[i] + (0.5 * dz * gravityMPerS2 * Density(temperatureAtDepthK(z), p[i]));
            p[i + 1] = p[i] + (dz * gravityMPerS2 * Density(temperatureAtDepthK(z + (0.5 * dz)), half));
        }

        return p;
    }

    /// <summary>Pressure at the bottom of <paramref name="depthM"/> of ice.</summary>
    public static double AtDepthPa(Func<double, double> temperatureAtDepthK, double depthM, double gravityMPerS2, double surfacePressurePa, int steps = DefaultSteps) =>
        Profile(temperatureAtDepthK, depthM, gravityMPerS2, surfacePressurePa, steps)[^1];

    /// <summary>The constant-density shortcut p = p_s + ρ̄ g z.</summary>
    public static double ConstantDensityPa(double meanDensityKgPerM3, double depthM, double gravityMPerS2, double surfacePressurePa = 0.0) =>
        surfacePressurePa + (meanDensityKgPerM3 * gravityMPerS2 * depthM);

    /// <summary>
    /// Density for the integral. A profile whose base sits at the melting point meets the melting curve within
    /// numerical noise; there the state is held just below the curve (MODEL: the density change is ~1e-5 relative).
    /// </summary>
    private static double Density(double temperatureK, double pressurePa)
    {
        if (temperatureK > TriplePoint.IhIiiLiquidTemperatureK && pressurePa > TriplePoint.PressurePa && pressurePa <= MeltingCurve.MaximumPressurePa)
        {
            var meltingK = MeltingCurve.TemperatureK(pressurePa);
            if (temperatureK > meltingK) temperatureK = meltingK;
        }

        return IceIh.DensityKgPerM3(temperatureK, pressurePa);
    }
}
