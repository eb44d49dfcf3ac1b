namespace DescentOps.Physics.Attitude;

/// <summary>
/// Tilt of a melt probe in its steering plane (MODEL, reference note §7.2). A head split in two halves with a power
/// difference ΔP melts unevenly; the halves' centroids are 8R/(3π) apart, so the head alone would turn at
/// ω_head = η_st·3ΔP/(4R³ρ_i H), H = L + Δh_s. A rigid body of length ℓ in a hole of radial clearance w_c can only
/// follow curves of radius ≥ ℓ²/(8w_c) (sagitta), i.e. |ω| ≤ 8 v w_c/ℓ². A pendulum-stabilised probe relaxes back to
/// its reference tilt with time constant τ_r. Steering by differential heating and pendulum stabilisation are
/// published qualitatively (Aamot 1967, CRREL SR 116; Dachwald et al. 2014, Ann. Glaciol. 55(65), 14); the equations are ours.
/// </summary>
public static class TiltDynamics
{
    /// <summary>Default steering efficiency η_st (MODEL).</summary>
    public const double DefaultSteeringEfficiency = 0.5;

    /// <summary>Default radial clearance without side heaters: about the melt film (MODEL).</summary>
    public const double DefaultClearanceM = 0.5e-3;

    public static double HeadTurnRateRadPerS(double powerDifferenceW, double radiusM, double iceDensityKgPerM3, double meltEnthalpyJPerKg, double steeringEfficiency = DefaultSteeringEfficiency)
    {
        ValidRange.RequirePositive(radiusM, nameof(radiusM), "m", "the tilt model");
        ValidRange.RequirePositive(iceDensityKgPerM3, nameof(iceDensityKgPerM3), "kg/m³", "the tilt model");
        ValidRange.RequirePositive(meltEnthalpyJPerKg, nameof(meltEnthalpyJPerKg), "J/kg", "the tilt model");
        ValidRange.Require(steeringEfficiency, 0.0, 1.0, nameof(steeringEfficiency), "", "the tilt model");
        return steeringEfficiency * 3.0 * powerDifferenceW / (4.0 * radiusM * radiusM * radiusM * iceDensityKgPerM3 * meltEnthalpyJPerKg);
    }

    /// <summary>Radius of the path the head alone would cut, 4 R P_h/(3π ΔP).</summary>
    public static double HeadPathRadiusM(double radiusM, double headPowerW, double powerDifferenceW) =>
        4.0 * ValidRange.RequirePositive(radiusM, nameof(radiusM), "m", "the tilt model") * headPowerW
        / (3.0 * Math.PI * ValidRange.RequirePositive(Math.Abs(powerDifferenceW), nameof(powerDifferenceW), "W", "the tilt model"));

    /// <summary>Tightest curve a rigid probe fits through, ℓ²/(8 w_c).</summary>
    public static double KinematicMinimumRadiusM(double lengthM, double clearanceM) =>
        Math.Pow(ValidRange.RequirePositive(lengthM, nameof(lengthM), "m", "the tilt model"), 2)
        / (8.0 * ValidRange.RequirePositive(clearanceM, nameof(clearanceM), "m", "the tilt model"));

    /// <summary>Largest turn rate at speed v: 8 v w_c/ℓ².</summary>
    public static double KinematicTurnRateLimitRadPerS(double velocityMPerS, double clearanceM, double lengthM) =>
        ValidRange.RequireNonNegative(velocityMPerS, nameof(velocityMPerS), "m/s", "the tilt model") / KinematicMinimumRadiusM(lengthM, clearanceM);

    /// <summary>
    /// dθ/dt = clip(ω_head + ω_dist − (θ − θ_ref)/τ_r, −ω_kin, ω_kin); τ_r = +∞ for a head-supported probe with no restoring.
    /// </summary>
    public static double TiltRateRadPerS(double tiltRad, double referenceTiltRad, double headTurnRateRadPerS, double disturbanceRateRadPerS, double restoringTimeS, double kinematicLimitRadPerS)
    {
        ValidRange.Require(restoringTimeS, double.Epsilon, double.PositiveInfinity, nameof(restoringTimeS), "s", "the tilt model");
        ValidRange.RequireNonNegative(kinematicLimitRadPerS, nameof(kinematicLimitRadPerS), "rad/s", "the tilt model");
        var restoring = double.IsPositiveInfinity(restoringTimeS) ? 0.0 : (tiltRad - referenceTiltRad) / restoringTimeS;
        return Math.Clamp(headTurnRateRadPerS + disturbanceRateRadPerS - restoring, -kinematicLimitRadPerS, kinematicLimitRadPerS);
    }
}
