namespace DescentOps.Physics.Descent;

/// <summary>
/// The energy balance of the water gap along the side of a moving probe (MODEL, after the critical refreezing length of
/// Aamot 1967 and the treatments of Schüller and Kowalski 2019 and Li, Talalay et al. 2023). In the probe's frame the ice
/// wall passes the body at the descent speed v. Heat reaches the side from the head's film water (its superheat, and any
/// boiled-off vapour, delivered at the head) and from the wall heaters; conduction into the ice takes
/// Q_lat(z) = 2πΦ z H(τ_z)/τ_z up to a distance z behind the head (<see cref="LateralConduction"/>). The wall heaters are
/// zoned: their power P_wall is laid out in proportion to the local conduction loss, a share β = P_wall/Q_lat(ℓ) of it
/// everywhere along the body (uniform heaters would need far more power, since the loss peaks at the head's rim). A
/// running surplus melts the wall back, a running deficit freezes water onto it; one kilogram per second changes the gap
/// by 1/(ρ_i 2πR v), so with K = ρ_i L 2πR v the gap at z ≤ ℓ is
/// <code>w(z) = w0 + [Q_film − (1 − β) Q_lat(z)] / K</code>
/// and behind the body w0 + [Q_film + P_wall − Q_lat(z)]/K; w0 is the design gap of the body (<c>freeze_gap</c>). Where w
/// reaches zero the refrozen ice closes on the body: within the body's length the probe is held. With no wall heat and
/// no design gap the closure is Aamot's critical refreezing length, where the film's heat is used up.
/// </summary>
/// <remarks>
/// The closure by gap width comes long before all the meltwater has refrozen (that needs a deficit ṁL, some R/(2w0)
/// times larger), so the water supply is not a limit here. The clearance used for steering is the mean of w along the body.
/// </remarks>
public static class SideBalance
{
    private const int Samples = 16;
    private const string Model = "the side balance";

    /// <param name="lengthM">Body length ℓ.</param>
    /// <param name="radiusM">Body radius R.</param>
    /// <param name="velocityMPerS">Descent speed (positive).</param>
    /// <param name="kirchhoffPotentialWPerM">Φ(T∞, T_m).</param>
    /// <param name="effectiveDiffusivityM2PerS">κ_eff.</param>
    /// <param name="iceDensityKgPerM3">ρ_i.</param>
    /// <param name="latentJPerKg">L.</param>
    /// <param name="filmHeatW">Heat the film water brings to the side at the head (superheat and boiled-off vapour).</param>
    /// <param name="wallPowerW">Wall heater power, zoned in proportion to the local loss.</param>
    /// <param name="designGapM">Water gap w0 around the body where nothing froze or melted.</param>
    public static SideBalanceSolution Solve(double lengthM, double radiusM, double velocityMPerS, double kirchhoffPotentialWPerM, double effectiveDiffusivityM2PerS, double iceDensityKgPerM3, double latentJPerKg, double filmHeatW, double wallPowerW, double designGapM)
    {
        ValidRange.RequirePositive(lengthM, nameof(lengthM), "m", Model);
        ValidRange.RequirePositive(radiusM, nameof(radiusM), "m", Model);
        ValidRange.RequirePositive(velocityMPerS, nameof(velocityMPerS), "m/s", Model);
        ValidRange.RequireNonNegative(filmHeatW, nameof(filmHeatW), "W", Model);
        ValidRange.RequireNonNegative(wallPowerW, nameof(wallPowerW), "W", Model);
        ValidRange.RequireNonNegative(designGapM, nameof(designGapM), "m", Model);
        var k = iceDensityKgPerM3 * latentJPerKg * 2.0 * Math.PI * radiusM * velocityMPerS;
        var designW = k * designGapM;
        var scale = effectiveDiffusivityM2PerS / (velocityMPerS * radiusM * radiusM);

        double Loss(double z)
        {
            if (z <= 0 || kirchhoffPotentialWPerM == 0 || effectiveDiffusivityM2PerS == 0) return 0.0;
            var tau = Math.Min(scale * z, CylinderConduction.MaximumTau);
            return 2.0 * Math.PI * kirchhoffPotentialWPerM * z * CylinderConductionTable.H(tau) / tau;
        }

        var bodyLossW = Loss(lengthM);
        var share = bodyLossW > 0 ? wallPowerW / bodyLossW : double.PositiveInfinity;
        double Budget(double z) => z <= lengthM
            ? filmHeatW + designW - (bodyLossW > 0 ? (1.0 - share) * Loss(z) : 0.0)
            : filmHeatW + designW + wallPowerW - Loss(z);

        var requiredWallW = Math.Max(0.0, bodyLossW - filmHeatW - designW);
        var held = wallPowerW < requiredWallW * (1.0 - 1e-9);
        var closureM = held ? Bisect(Budget, 0.0, lengthM) : ClosureBeyondBody(Loss, filmHeatW + wallPowerW + designW, lengthM);
        var gapSum = 0.0;
        if (!held)
        {
            for (var i = 0; i < Samples; i++) gapSum += Budget(lengthM * (i + 0.5) / Samples) / k;
        }

        return new SideBalanceSolution(filmHeatW + requiredWallW, filmHeatW + wallPowerW, closureM, held, held ? 0.0 : Math.Max(0.0, gapSum / Samples), bodyLossW);
    }

    private static double Bisect(Func<double, double> budget, double positiveAtM, double closedAtM)
    {
        double a = positiveAtM, b = closedAtM;
        for (var i = 0; i < 60 && b - a > 1e-9 * closedAtM; i++)
        {
            var m = 0.5 * (a + b);
            if (budget(m) > 0) a = m;
            else b = m;
        }

        return b;
    }

    /// <summary>Behind the body the heaters add nothing more: the gap closes where Q_lat reaches the whole supply.</summary>
    private static double ClosureBeyondBody(Func<double, double> loss, double supplyW, double lengthM)
    {
        var upper = lengthM;
        while (loss(upper) < supplyW)
        {
            upper *= 2.0;
            if (upper > 1e7) return double.PositiveInfinity;
        }

        return Bisect(z => supplyW - loss(z), upper / 2.0, upper);
    }
}
