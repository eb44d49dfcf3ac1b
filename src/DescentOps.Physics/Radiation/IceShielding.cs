namespace DescentOps.Physics.Radiation;

/// <summary>
/// Rule-of-thumb dose behind ice: D(x) = D_e0·exp(−x/λ_e) + D_b0·exp(−x/λ_b), electrons stopped in centimetres and their
/// bremsstrahlung photons in decimetres (RULE, from NIST data recalled from memory). Good enough to tell the surface
/// station and top tether from a probe a few metres down, not for a shield design.
/// </summary>
public static class IceShielding
{
    private const string Model = "the two-exponential ice shielding rule";

    /// <summary>Dose rate at a depth of ice (or ice-equivalent thickness).</summary>
    public static double DoseRateGyPerS(double depthM, double surfaceElectronDoseRateGyPerS, double electronLengthM, double surfacePhotonDoseRateGyPerS, double photonLengthM)
    {
        ValidRange.RequireNonNegative(depthM, nameof(depthM), "m", Model);
        ValidRange.RequireNonNegative(surfaceElectronDoseRateGyPerS, nameof(surfaceElectronDoseRateGyPerS), "Gy/s", Model);
        ValidRange.RequireNonNegative(surfacePhotonDoseRateGyPerS, nameof(surfacePhotonDoseRateGyPerS), "Gy/s", Model);
        ValidRange.RequirePositive(electronLengthM, nameof(electronLengthM), "m", Model);
        ValidRange.RequirePositive(photonLengthM, nameof(photonLengthM), "m", Model);
        return (surfaceElectronDoseRateGyPerS * Math.Exp(-depthM / electronLengthM)) + (surfacePhotonDoseRateGyPerS * Math.Exp(-depthM / photonLengthM));
    }

    /// <summary>Photon attenuation length 1/(μ/ρ·ρ) from a mass attenuation coefficient (m²/kg) and the ice density.</summary>
    public static double PhotonAttenuationLengthM(double massAttenuationM2PerKg, double iceDensityKgPerM3)
    {
        ValidRange.RequirePositive(massAttenuationM2PerKg, nameof(massAttenuationM2PerKg), "m²/kg", Model);
        ValidRange.Require(iceDensityKgPerM3, 800.0, 1000.0, nameof(iceDensityKgPerM3), "kg/m³", Model);
        return 1.0 / (massAttenuationM2PerKg * iceDensityKgPerM3);
    }
}
