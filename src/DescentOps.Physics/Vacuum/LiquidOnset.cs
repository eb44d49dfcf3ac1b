using DescentOps.Physics.Ice;

namespace DescentOps.Physics.Vacuum;

/// <summary>
/// When a probe starting on an airless surface can switch from sublimation to melting (MODEL, two necessary
/// conditions): the hole above it has been plugged by vapour re-deposited on the cold wall, and the ice above can
/// hold the cavity at the triple-point pressure or more.
/// </summary>
public static class LiquidOnset
{
    /// <summary>Default seal length in hole diameters above the probe (MODEL, no published validation known to us).</summary>
    public const double DefaultSealDiameters = 2.0;

    /// <summary>Head depth at which the hole behind the probe is sealed: ℓ + n_seal·2R.</summary>
    public static double SealDepthM(double probeLengthM, double radiusM, double sealDiameters = DefaultSealDiameters) =>
        ValidRange.RequirePositive(probeLengthM, nameof(probeLengthM), "m", "the seal depth")
        + (ValidRange.RequireNonNegative(sealDiameters, nameof(sealDiameters), "", "the seal depth") * 2.0 * ValidRange.RequirePositive(radiusM, nameof(radiusM), "m", "the seal depth"));

    /// <summary>Overburden depth that holds the triple-point pressure: p_t/(ρ_i g).</summary>
    public static double MinimumLiquidDepthM(double iceDensityKgPerM3, double gravityMPerS2) =>
        TriplePoint.PressurePa / (ValidRange.RequirePositive(iceDensityKgPerM3, nameof(iceDensityKgPerM3), "kg/m³", "the liquid onset depth")
                                  * ValidRange.RequirePositive(gravityMPerS2, nameof(gravityMPerS2), "m/s²", "the liquid onset depth"));

    /// <summary>Whether the melting model applies at this head depth (both conditions met).</summary>
    public static bool MeltingPossible(double headDepthM, double probeLengthM, double radiusM, double iceDensityKgPerM3, double gravityMPerS2, double sealDiameters = DefaultSealDiameters) =>
        headDepthM >= Math.Max(SealDepthM(probeLengthM, radiusM, sealDiameters), MinimumLiquidDepthM(iceDensityKgPerM3, gravityMPerS2));
}
