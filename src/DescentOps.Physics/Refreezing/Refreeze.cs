using DescentOps.Physics.Descent;
using DescentOps.Physics.Ice;
using DescentOps.Physics.Water;
using MathNet.Numerics.RootFinding;

namespace DescentOps.Physics.Refreezing;

/// <summary>
/// Refreezing of meltwater around a probe (reference note §5): freeze-in of a gap around a stopped probe, energy and
/// time to melt free, and the critical refreezing lengths behind a moving probe.
/// </summary>
/// <remarks>
/// Shared MODEL choices: k = 651/T through the Kirchhoff potential Φ; the variable heat capacity through Δh_s(T∞) =
/// h(T_m) − h(T∞) (IAPWS R10-06), so Ste = Δh_s/L and κ_eff = Φ/(ρ_i Δh_s); L of pure ice at T_m
/// (<see cref="FusionLatentHeat"/>); ice properties at the triple-point pressure (pressure changes them by &lt; 1e-4
/// below 1 MPa). The probe's own stored heat and the 9 % expansion on freezing are ignored.
/// </remarks>
public static class Refreeze
{
    private const string Model = "the refreezing model";

    /// <summary>
    /// Freeze-in of a water gap of width w against the cold borehole wall (gap ≪ probe radius, planar): case (b) of the
    /// Stefan problem, liquid at T_m freezing onto ice at T∞; the gap is closed when s = 2λ√(κ_eff t) = w.
    /// </summary>
    public static RefreezeSolution FreezeIn(double gapM, double iceTemperatureK, double meltingTemperatureK)
    {
        ValidRange.RequirePositive(gapM, nameof(gapM), "m", Model);
        var ice = IceState.Of(iceTemperatureK, meltingTemperatureK);
        if (ice.SensibleJPerKg == 0) return new RefreezeSolution(0.0, 0.0, double.PositiveInfinity);
        var lambda = StefanProblem.ColdWallFrontConstant(ice.StefanNumber);
        var time = Math.Pow(gapM / (2.0 * lambda), 2) / ice.DiffusivityM2PerS;
        return new RefreezeSolution(ice.StefanNumber, lambda, time);
    }

    /// <summary>
    /// Freeze-in of a gap around a stopped probe whose wall had been at T_m for an exposure time t_e (z/v for a moving
    /// probe), so the ice behind the wall is already warmed. The wall keeps drawing the cylinder flux of
    /// <see cref="CylinderConduction"/> while the gap water freezes at T_m: the gap is closed after t_f with
    /// (Φ R/κ_eff)[H(κ_eff (t_e + t_f)/R²) − H(κ_eff t_e/R²)] = c ρ_w L w (MODEL, reference note §5.2), where
    /// c = Φ/(√(πκ_eff) ρ_w L λ′), λ′ the front constant of planar freezing with the ice's properties at each temperature
    /// (<see cref="VariablePropertyFreezing"/>), makes the planar limit exact for any Stefan number and ice temperature
    /// (c → 1 for small Ste, where the note's form holds). Checked against a radial enthalpy solver in the tests.
    /// <c>stefanCorrected: false</c> gives the note's uncorrected form (c = 1), kept for its check values.
    /// </summary>
    public static RefreezeSolution FreezeInAroundProbe(double gapM, double radiusM, double exposureTimeS, double iceTemperatureK, double meltingTemperatureK, bool stefanCorrected = true)
    {
        ValidRange.RequirePositive(gapM, nameof(gapM), "m", Model);
        ValidRange.RequirePositive(radiusM, nameof(radiusM), "m", Model);
        ValidRange.RequireNonNegative(exposureTimeS, nameof(exposureTimeS), "s", Model);
        var ice = IceState.Of(iceTemperatureK, meltingTemperatureK);
        if (ice.SensibleJPerKg == 0) return new RefreezeSolution(0.0, 0.0, double.PositiveInfinity);
        var lambda = StefanProblem.ColdWallFrontConstant(ice.StefanNumber);
        var r2OverKappa = radiusM * radiusM / ice.DiffusivityM2PerS;
        var tauExposure = exposureTimeS / r2OverKappa;
        // The wall-at-T_m heat balance is the small-Stefan limit. The factor c = Φ/(√(πκ_eff) ρ_w L λ′) makes its planar
        // limit the exact planar freezing front s = 2λ′√t with the ice's properties at each temperature
        // (VariablePropertyFreezing), whose frozen layer cools below T_m as it grows; with constant properties c is
        // (ρ_i/ρ_w) Ste/(λ√π) of the Neumann case (b), → 1 as Ste → 0 (checked against an enthalpy solver, 100-270 K).
        var latentPerVolume = LiquidWater.DensityKgPerM3 * ice.LatentJPerKg;
        var front = VariablePropertyFreezing.FrontConstantMPerRootS(iceTemperatureK, meltingTemperatureK, latentPerVolume);
        var stefanFactor = stefanCorrected ? ice.PotentialWPerM / (Math.Sqrt(Math.PI * ice.DiffusivityM2PerS) * latentPerVolume * front) : 1.0;
        var target = CylinderConduction.H(tauExposure) + (stefanFactor * LiquidWater.DensityKgPerM3 * ice.LatentJPerKg * gapM / (ice.PotentialWPerM * radiusM / ice.DiffusivityM2PerS));
        var tauEnd = SolveTau(target, tauExposure);
        return new RefreezeSolution(ice.StefanNumber, lambda, (tauEnd - tauExposure) * r2OverKappa) { VariablePropertyFrontMPerRootS = front };
    }

    /// <summary>
    /// Energy and time for the probe's heaters (head and wall: both reach the frozen annulus through the body, MODEL) of
    /// power P to re-melt a gap of width w that froze around a stopped probe of length ℓ, after it has been held for
    /// <paramref name="heldForS"/> since it stopped (MODEL). The heaters must (1) melt the annulus 2πRℓwρ_w L, (2) put back
    /// the heat the ice near the wall lost while the probe was held: a wall held at T_m would have drawn
    /// A(ΦR/κ)[H(τ_e + τ_hold) − H(τ_e)] over the hold (A = 2πRℓ), of which the freezing gap water paid its latent heat;
    /// the rest is the cooling, at most the heat stored before the hold, A(ΦR/κ)H(τ_e) + the gap's latent heat; and (3) pay
    /// the wall's continuing loss, the transient cylinder loss 2πℓΦ G(τ) while it exceeds the steady loss C·Φ of the probe
    /// as a finite body (<see cref="StallLimit.ProbeCapacitanceM"/>), and C·Φ after. A longer hold costs more: the ice has
    /// cooled further. Power not above C·Φ never melts free: +∞ is returned with C·Φ as the power needed.
    /// </summary>
    public static MeltFreeSolution MeltFree(double gapM, double radiusM, double lengthM, double powerW, double exposureTimeS, double iceTemperatureK, double meltingTemperatureK, double heldForS = 0.0)
    {
        ValidRange.RequirePositive(lengthM, nameof(lengthM), "m", Model);
        ValidRange.RequirePositive(powerW, nameof(powerW), "W", Model);
        ValidRange.RequireNonNegative(heldForS, nameof(heldForS), "s", Model);
        var frozen = FreezeInAroundProbe(gapM, radiusM, exposureTimeS, iceTemperatureK, meltingTemperatureK);
        var ice = IceState.Of(iceTemperatureK, meltingTemperatureK);
        var annulusJ = 2.0 * Math.PI * radiusM * lengthM * gapM * LiquidWater.DensityKgPerM3 * ice.LatentJPerKg;
        if (double.IsPositiveInfinity(frozen.FreezeTimeS)) return new MeltFreeSolution(annulusJ, annulusJ / powerW) { HoldOpenPowerW = 0.0 };

        var steadyLossW = StallLimit.StallPowerW(StallLimit.ProbeCapacitanceM(radiusM, lengthM), ice.PotentialWPerM);
        if (powerW <= steadyLossW) return new MeltFreeSolution(double.PositiveInfinity, double.PositiveInfinity) { HoldOpenPowerW = steadyLossW };

        var r2OverKappa = radiusM * radiusM / ice.DiffusivityM2PerS;
        var holdS = Math.Max(heldForS, frozen.FreezeTimeS);
        var wallScaleJ = 2.0 * Math.PI * radiusM * lengthM * ice.PotentialWPerM * radiusM / ice.DiffusivityM2PerS;
        var tauExposure = exposureTimeS / r2OverKappa;
        var storedJ = (wallScaleJ * CylinderConduction.H(tauExposure)) + annulusJ;
        var coolingJ = Math.Clamp((wallScaleJ * (CylinderConduction.H(tauExposure + (holdS / r2OverKappa)) - CylinderConduction.H(tauExposure))) - annulusJ, 0.0, storedJ);

        // The ice is at best as warm as when the gap froze; the cooling since is paid above, so the loss restarts there.
        var tauStart = (exposureTimeS + frozen.FreezeTimeS) / r2OverKappa;
        var transientJPerTau = 2.0 * Math.PI * lengthM * ice.PotentialWPerM * r2OverKappa;

        // τ* where the transient loss falls to the steady one (G decreases monotonically).
        var gFloor = steadyLossW / (2.0 * Math.PI * lengthM * ice.PotentialWPerM);
        var tauSwitch = CylinderConduction.G(tauStart) <= gFloor ? tauStart : SolveDecreasingG(gFloor, tauStart);
        var hStart = CylinderConduction.H(tauStart);

        double LossJ(double t)
        {
            var tau = tauStart + (t / r2OverKappa);
            if (tau <= tauSwitch) return transientJPerTau * (CylinderConduction.H(tau) - hStart);
            return (transientJPerTau * (CylinderConduction.H(tauSwitch) - hStart)) + (steadyLossW * (tau - tauSwitch) * r2OverKappa);
        }

        var neededJ = annulusJ + coolingJ;
        double Surplus(double t) => (powerW * t) - neededJ - LossJ(t);
        var upper = neededJ / powerW;
        while (Surplus(upper) < 0) upper *= 2.0;
        var time = Brent.FindRoot(Surplus, 0.0, upper, 1e-9 * upper, 500);
        return new MeltFreeSolution(powerW * time, time) { HoldOpenPowerW = steadyLossW, CoolingJ = coolingJ };
    }

    private static double SolveDecreasingG(double targetG, double tauLower)
    {
        var upper = tauLower * 2.0;
        while (CylinderConduction.G(upper) > targetG) upper *= 2.0;
        return Brent.FindRoot(t => CylinderConduction.G(t) - targetG, tauLower, upper, 1e-12 * upper, 500);
    }

    /// <summary>
    /// Critical refreezing lengths behind a moving probe without wall heating (MODEL, reference note §5.3, after the
    /// concept of Aamot 1967 and Li, Talalay et al. 2023): onset where Q_lat(z) equals the film water's superheat Q_w,
    /// closure where it equals Q_w + ṁL (all meltwater refrozen), Q_lat from <see cref="LateralConduction"/>.
    /// </summary>
    public static CriticalRefreezeLengths CriticalLengths(ProbeGeometry geometry, DescentSolution descent, double farFieldTemperatureK, double pressurePa)
    {
        ArgumentNullException.ThrowIfNull(geometry);
        ArgumentNullException.ThrowIfNull(descent);
        ValidRange.RequirePositive(descent.VelocityMPerS, nameof(descent.VelocityMPerS), "m/s", Model + " (a moving probe)");
        var meltingK = MeltingCurve.TemperatureK(pressurePa);
        var phi = IceConductivity.KirchhoffPotentialWPerM(farFieldTemperatureK, meltingK, IceConductivityFit.PetrenkoWhitworth1999);
        var sensible = IceIh.SensibleHeatJPerKg(farFieldTemperatureK, meltingK, pressurePa);
        if (phi == 0 || sensible == 0) return new CriticalRefreezeLengths(double.PositiveInfinity, double.PositiveInfinity);
        var kappa = LateralConduction.EffectiveDiffusivityM2PerS(phi, IceIh.DensityKgPerM3(farFieldTemperatureK, pressurePa), sensible);
        double Loss(double z) => LateralConduction.LossW(z, descent.VelocityMPerS, geometry.RadiusM, phi, kappa);
        return new CriticalRefreezeLengths(
            LengthWhere(Loss, descent.FilmSuperheatW),
            LengthWhere(Loss, descent.FilmSuperheatW + descent.LatentW));
    }

    private static double LengthWhere(Func<double, double> increasingLoss, double targetW)
    {
        if (targetW <= 0) return 0.0;
        var upper = 1e-3;
        while (increasingLoss(upper) < targetW) upper *= 2.0;
        return Brent.FindRoot(z => increasingLoss(z) - targetW, 0.0, upper, 1e-12 + (1e-10 * upper), 500);
    }

    private static double SolveTau(double targetH, double tauLower)
    {
        var upper = Math.Max(1e-6, tauLower * 2.0);
        while (CylinderConduction.H(upper) < targetH)
        {
            upper *= 2.0;
            if (upper > CylinderConduction.MaximumTau) throw new ArgumentOutOfRangeException(nameof(targetH), targetH, "The gap does not freeze within the range of the cylinder conduction functions (τ ≤ 1e12).");
        }

        return Brent.FindRoot(t => CylinderConduction.H(t) - targetH, tauLower, upper, 1e-13 * upper, 500);
    }

    /// <summary>The ice-side quantities every refreezing estimate needs.</summary>
    private readonly record struct IceState(double SensibleJPerKg, double LatentJPerKg, double PotentialWPerM, double DiffusivityM2PerS)
    {
        public double StefanNumber => SensibleJPerKg / LatentJPerKg;

        public static IceState Of(double iceTemperatureK, double meltingTemperatureK)
        {
            ValidRange.Require(meltingTemperatureK, FusionLatentHeat.MinimumMeltingTemperatureK, TriplePoint.TemperatureK, nameof(meltingTemperatureK), "K", Model);
            ValidRange.Require(iceTemperatureK, IceConductivity.MinimumTemperatureK(IceConductivityFit.PetrenkoWhitworth1999), meltingTemperatureK, nameof(iceTemperatureK), "K", Model);
            const double p = TriplePoint.PressurePa;
            var sensible = IceIh.SensibleHeatJPerKg(iceTemperatureK, meltingTemperatureK, p);
            var phi = IceConductivity.KirchhoffPotentialWPerM(iceTemperatureK, meltingTemperatureK, IceConductivityFit.PetrenkoWhitworth1999);
            var kappa = LateralConduction.EffectiveDiffusivityM2PerS(phi, IceIh.DensityKgPerM3(iceTemperatureK, p), sensible);
            return new IceState(sensible, FusionLatentHeat.AtMeltingTemperatureJPerKg(meltingTemperatureK), phi, kappa);
        }
    }
}
