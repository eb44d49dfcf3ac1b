namespace DescentOps.Physics.Ocean;

/// <summary>
/// Depth below the top of a water column from sea pressure, and back. Gravity is a parameter because the ocean may
/// lie under an ice shell on a low-gravity body.
/// </summary>
public static class SeawaterPressureDepth
{
    /// <summary>Default integration steps; the density changes so smoothly that 200 RK4 steps reach 1e-9 relative.</summary>
    public const int DefaultSteps = 200;

    private const string Unesco = "the UNESCO 1983 depth formula";
    private const string Saunders = "the Saunders (1981) depth approximation";
    private const string Integral = "the hydrostatic integral over EOS-80 density";
    private const double PascalPerDecibar = 1e4;
    private const double MaximumSeaPressurePa = 100e6;

    /// <summary>
    /// Earth depth, UNESCO 1983 eq. 25 (Saunders and Fofonoff 1976): a 35 PSU, 0 °C ocean with latitude-dependent
    /// gravity that grows by 1.092e-6 m/s² per dbar.
    /// </summary>
    public static double UnescoEarthDepthM(double seaPressurePa, double latitudeRad)
    {
        ValidRange.Require(seaPressurePa, 0.0, MaximumSeaPressurePa, nameof(seaPressurePa), "Pa", Unesco);
        ValidRange.Require(latitudeRad, -Math.PI / 2, Math.PI / 2, nameof(latitudeRad), "rad", Unesco);
        var p = seaPressurePa / PascalPerDecibar;
        var x = Math.Sin(latitudeRad);
        x *= x;
        var gravity = 9.780318 * (1.0 + ((5.2788e-3 + (2.36e-5 * x)) * x));
        return SpecificVolumeIntegral(p) / (gravity + (1.092e-6 * p));
    }

    /// <summary>
    /// Saunders (1981), "Practical conversion of pressure to depth", J. Phys. Oceanogr. 11: a quadratic good to about
    /// 0.1 % on Earth (coefficients recalled from memory in the project's reference note).
    /// </summary>
    public static double SaundersEarthDepthM(double seaPressurePa, double latitudeRad)
    {
        ValidRange.Require(seaPressurePa, 0.0, MaximumSeaPressurePa, nameof(seaPressurePa), "Pa", Saunders);
        ValidRange.Require(latitudeRad, -Math.PI / 2, Math.PI / 2, nameof(latitudeRad), "rad", Saunders);
        var p = seaPressurePa / PascalPerDecibar;
        var s = Math.Sin(latitudeRad);
        var c1 = (5.92 + (5.25 * s * s)) * 1e-3;
        return ((1.0 - c1) * p) - (2.21e-6 * p * p);
    }

    /// <summary>
    /// The UNESCO numerator (∫dp/ρ of a 35 PSU, 0 °C Earth ocean) over a constant body gravity. Carries Earth-ocean
    /// compressibility; for other salinities or temperatures use <see cref="IntegratedDepthM"/>.
    /// </summary>
    public static double StandardOceanDepthM(double seaPressurePa, double gravityMPerS2)
    {
        ValidRange.Require(seaPressurePa, 0.0, MaximumSeaPressurePa, nameof(seaPressurePa), "Pa", Unesco);
        ValidRange.RequirePositive(gravityMPerS2, nameof(gravityMPerS2), "m/s²", Unesco);
        return SpecificVolumeIntegral(seaPressurePa / PascalPerDecibar) / gravityMPerS2;
    }

    /// <summary>
    /// Depth between two sea pressures in a column of uniform practical salinity and temperature, integrating
    /// dz/dp = 1/(ρ g) with EOS-80 density (classical RK4 in pressure).
    /// </summary>
    public static double IntegratedDepthM(double topSeaPressurePa, double bottomSeaPressurePa, double gravityMPerS2, double practicalSalinity, double temperatureK, int steps = DefaultSteps)
    {
        ValidRange.Require(topSeaPressurePa, 0.0, MaximumSeaPressurePa, nameof(topSeaPressurePa), "Pa", Integral);
        ValidRange.Require(bottomSeaPressurePa, topSeaPressurePa, MaximumSeaPressurePa, nameof(bottomSeaPressurePa), "Pa", Integral);
        ValidRange.RequirePositive(gravityMPerS2, nameof(gravityMPerS2), "m/s²", Integral);
        RequireSteps(steps);
        double Slope(double p) => 1.0 / (SeawaterDensity.Eos80KgPerM3(practicalSalinity, temperatureK, p) * gravityMPerS2);
        var h = (bottomSeaPressurePa - topSeaPressurePa) / steps;
        var z = 0.0;
        for (var i = 0; i < steps; i++)
        {
            var p = topSeaPressurePa + (i * h);
            // dz/dp depends on p only, so RK4 reduces to Simpson's rule on each step.
            z += h / 6.0 * (Slope(p) + (4.0 * Slope(p + (0.5 * h))) + Slope(p + h));
        }

        return z;
    }

    /// <summary>
    /// Sea pressure at a depth below the top of a uniform column whose top is at <paramref name="topSeaPressurePa"/>
    /// (for an ocean under floating ice, the ice overburden), integrating dp/dz = ρ(S, T, p) g by RK4.
    /// </summary>
    public static double IntegratedSeaPressurePa(double depthBelowTopM, double topSeaPressurePa, double gravityMPerS2, double practicalSalinity, double temperatureK, int steps = DefaultSteps)
    {
        ValidRange.RequireNonNegative(depthBelowTopM, nameof(depthBelowTopM), "m", Integral);
        ValidRange.Require(topSeaPressurePa, 0.0, MaximumSeaPressurePa, nameof(topSeaPressurePa), "Pa", Integral);
        ValidRange.RequirePositive(gravityMPerS2, nameof(gravityMPerS2), "m/s²", Integral);
        RequireSteps(steps);
        double Slope(double p) => SeawaterDensity.Eos80KgPerM3(practicalSalinity, temperatureK, p) * gravityMPerS2;
        var h = depthBelowTopM / steps;
        var pressure = topSeaPressurePa;
        for (var i = 0; i < steps; i++)
        {
            var k1 = Slope(pressure);
            var k2 = Slope(pressure + (0.5 * h * k1));
            var k3 = Slope(pressure + (0.5 * h * k2));
            var k4 = Slope(pressure + (h * k3));
            pressure += h / 6.0 * (k1 + (2.0 * k2) + (2.0 * k3) + k4);
        }

        return pressure;
    }

    private static void RequireSteps(int steps)
    {
        if (steps < 1) throw new ArgumentOutOfRangeException(nameof(steps), steps, "steps must be at least 1.");
    }

    // J/kg for p in dbar.
    private static double SpecificVolumeIntegral(double pDbar) =>
        pDbar * (9.72659 + (pDbar * (-2.2512e-5 + (pDbar * (2.279e-10 - (pDbar * 1.82e-15))))));
}
