namespace DescentOps.Physics.Descent;

/// <summary>
/// Heat drawn through the side wall of a probe moving at speed v. Each wall element z behind the head has been at
/// T_m for t = z/v and loses heat like a cylinder suddenly held at T_m (Carslaw and Jaeger 1959, §13.5), so
/// Q_lat(ℓ) = 2πR ∫₀^ℓ (Φ/R) G(κ z/(v R²)) dz = 2πΦ ℓ H(τ_ℓ)/τ_ℓ with τ_ℓ = κℓ/(vR²); our reading of Aamot's
/// method (1967, CRREL Tech. Rep. 194; his equations not seen).
/// </summary>
/// <remarks>
/// MODEL: with k(T) the transient problem is not linear; we use the Kirchhoff potential Φ and an effective diffusivity
/// κ_eff = Φ/(ρ_i Δh_s), exact in the steady limit and consistent in stored energy. The head rim is assumed to meet
/// undisturbed far-field ice (pre-warming ahead of the head ignored), which slightly overstates the loss.
/// </remarks>
public static class LateralConduction
{
    /// <summary>Effective diffusivity κ_eff = Φ/(ρ_i Δh_s); zero when the ice is already at its melting point.</summary>
    public static double EffectiveDiffusivityM2PerS(double kirchhoffPotentialWPerM, double iceDensityKgPerM3, double sensibleHeatJPerKg)
    {
        ValidRange.RequireNonNegative(kirchhoffPotentialWPerM, nameof(kirchhoffPotentialWPerM), "W/m", "the lateral loss");
        ValidRange.RequirePositive(iceDensityKgPerM3, nameof(iceDensityKgPerM3), "kg/m³", "the lateral loss");
        ValidRange.RequireNonNegative(sensibleHeatJPerKg, nameof(sensibleHeatJPerKg), "J/kg", "the lateral loss");
        return sensibleHeatJPerKg == 0 ? 0.0 : kirchhoffPotentialWPerM / (iceDensityKgPerM3 * sensibleHeatJPerKg);
    }

    /// <summary>Heat per second to hold a wall length ℓ behind the head at T_m.</summary>
    public static double LossW(double wallLengthM, double velocityMPerS, double radiusM, double kirchhoffPotentialWPerM, double effectiveDiffusivityM2PerS)
    {
        ValidRange.RequireNonNegative(wallLengthM, nameof(wallLengthM), "m", "the lateral loss");
        ValidRange.RequirePositive(velocityMPerS, nameof(velocityMPerS), "m/s", "the lateral loss");
        ValidRange.RequirePositive(radiusM, nameof(radiusM), "m", "the lateral loss");
        ValidRange.RequireNonNegative(kirchhoffPotentialWPerM, nameof(kirchhoffPotentialWPerM), "W/m", "the lateral loss");
        ValidRange.RequireNonNegative(effectiveDiffusivityM2PerS, nameof(effectiveDiffusivityM2PerS), "m²/s", "the lateral loss");
        if (wallLengthM == 0 || kirchhoffPotentialWPerM == 0 || effectiveDiffusivityM2PerS == 0) return 0.0;
        var tau = effectiveDiffusivityM2PerS * wallLengthM / (velocityMPerS * radiusM * radiusM);
        return 2.0 * Math.PI * kirchhoffPotentialWPerM * wallLengthM * CylinderConduction.H(tau) / tau;
    }
}
