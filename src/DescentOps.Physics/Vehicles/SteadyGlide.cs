namespace DescentOps.Physics.Vehicles;

/// <summary>
/// Steady wings-level glide of a buoyancy glider (Leonard and Graver 2001, "Model-based feedback control of autonomous
/// underwater gliders", IEEE J. Oceanic Eng. 26(4)). Gravity is a parameter: the same net heaviness on a low-gravity
/// body glides at √(g_body/g_Earth) of the Earth speed, which is why gliders under an icy moon's shell are slow.
/// </summary>
public static class SteadyGlide
{
    private const string Model = "the steady glide model";

    /// <summary>Shallowest glide the wing can fly, atan(2√(K_D·K_D0)/K_L), for K_L0 = 0.</summary>
    public static double MinimumGlidePathAngleRad(GliderCoefficients coefficients)
    {
        ArgumentNullException.ThrowIfNull(coefficients);
        if (coefficients.LiftOffsetKgPerM != 0.0) throw new ArgumentOutOfRangeException(nameof(coefficients), "the closed form for the shallowest glide holds for a symmetric wing (K_L0 = 0) only.");
        return Math.Atan(2.0 * Math.Sqrt(coefficients.DragQuadraticKgPerMRad2 * coefficients.DragOffsetKgPerM) / coefficients.LiftSlopeKgPerMRad);
    }

    /// <summary>Glide at a trimmed angle of attack and net heaviness |m0| (kg; buoyant or heavy sets climb or dive, not the speed).</summary>
    public static GlideState AtAngleOfAttack(GliderCoefficients coefficients, double angleOfAttackRad, double netHeavinessKg, double gravityMPerS2)
    {
        ArgumentNullException.ThrowIfNull(coefficients);
        ValidRange.Require(angleOfAttackRad, 1e-4, 0.2, nameof(angleOfAttackRad), "rad", Model);
        ValidRange.RequirePositive(Math.Abs(netHeavinessKg), nameof(netHeavinessKg), "kg", Model);
        ValidRange.RequirePositive(gravityMPerS2, nameof(gravityMPerS2), "m/s²", Model);
        var lift = coefficients.LiftOffsetKgPerM + (coefficients.LiftSlopeKgPerMRad * angleOfAttackRad);
        var drag = coefficients.DragOffsetKgPerM + (coefficients.DragQuadraticKgPerMRad2 * angleOfAttackRad * angleOfAttackRad);
        var xi = Math.Atan(drag / lift);
        var speed = Math.Sqrt(Math.Abs(netHeavinessKg) * gravityMPerS2 / Math.Sqrt((lift * lift) + (drag * drag)));
        return new GlideState(angleOfAttackRad, xi, speed, speed * Math.Cos(xi), speed * Math.Sin(xi));
    }

    /// <summary>
    /// Angle of attack for a glide path angle, the efficient (small-α) root of the quadratic; glides steeper than about
    /// 45° or shallower than the minimum have no such trim.
    /// </summary>
    public static double AngleOfAttackRad(GliderCoefficients coefficients, double glidePathAngleRad)
    {
        ArgumentNullException.ThrowIfNull(coefficients);
        ValidRange.Require(glidePathAngleRad, MinimumGlidePathAngleRad(coefficients), Math.PI / 4, nameof(glidePathAngleRad), "rad", Model);
        var tan = Math.Tan(glidePathAngleRad);
        var kl = coefficients.LiftSlopeKgPerMRad;
        var kd = coefficients.DragQuadraticKgPerMRad2;
        var discriminant = Math.Max(0.0, (kl * kl * tan * tan) - (4.0 * kd * (coefficients.DragOffsetKgPerM - (coefficients.LiftOffsetKgPerM * tan))));
        return ((kl * tan) - Math.Sqrt(discriminant)) / (2.0 * kd);
    }

    /// <summary>
    /// Energy of one buoyancy-pump stroke, ΔV·p_abs/η. It works against absolute pressure, so under a thick shell every
    /// stroke costs more even at no extra depth.
    /// </summary>
    public static double PumpStrokeEnergyJ(double displacedVolumeM3, double absolutePressurePa, double pumpEfficiency)
    {
        ValidRange.RequirePositive(displacedVolumeM3, nameof(displacedVolumeM3), "m³", Model);
        ValidRange.RequirePositive(absolutePressurePa, nameof(absolutePressurePa), "Pa", Model);
        ValidRange.Require(pumpEfficiency, 1e-3, 1.0, nameof(pumpEfficiency), "(fraction)", Model);
        return displacedVolumeM3 * absolutePressurePa / pumpEfficiency;
    }

    /// <summary>Horizontal distance of one dive and climb through a depth band at a glide path angle, 2Δz/tan ξ.</summary>
    public static double HorizontalDistancePerCycleM(double depthBandM, double glidePathAngleRad)
    {
        ValidRange.RequirePositive(depthBandM, nameof(depthBandM), "m", Model);
        ValidRange.Require(glidePathAngleRad, 1e-3, Math.PI / 2, nameof(glidePathAngleRad), "rad", Model);
        return 2.0 * depthBandM / Math.Tan(glidePathAngleRad);
    }
}
