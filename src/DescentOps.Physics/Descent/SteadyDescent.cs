using DescentOps.Physics.Ice;
using DescentOps.Physics.Water;

namespace DescentOps.Physics.Descent;

/// <summary>
/// Steady descent of a cylindrical melt probe through ice at a far-field temperature (reference note §4):
/// close-contact melting at the head (<see cref="CloseContactMelting"/>), conduction loss through the side wall of a
/// moving cylinder (<see cref="LateralConduction"/>), and the stall limit (<see cref="StallLimit"/>).
/// </summary>
/// <remarks>
/// Modelling choices and sources:
/// <list type="bullet">
/// <item>Ice: density, sensible heat h(T_m) − h(T∞) from IAPWS R10-06 at the given pressure; T_m from IAPWS R14-08
/// (pure ice); L from <see cref="FusionLatentHeat"/> at that pressure.</item>
/// <item>Conductivity for Φ: k = 651/T (Petrenko and Whitworth 1999), the closed form the reference note uses for the
/// probe (MODEL; the fits differ by ±15 %).</item>
/// <item>Efficiency: not a parameter. The head's loss is the film superheat (fraction ½ carried away, MODEL); the
/// side's loss follows from the wall conduction. v/v0 is the head efficiency.</item>
/// <item>Load on the film: weight less buoyancy of the displaced meltwater, F = (m − ρ_w πR²ℓ) g; tether tension zero
/// (the tether pays out from the probe) (MODEL).</item>
/// <item>Lateral loss with κ_eff = Φ/(ρ_i Δh_s) (MODEL). The wall is held at T_m by the film water's superheat plus the
/// wall heaters; if they fall short, the wall takes only what they supply and the rest of it refreezes onto the
/// probe: <see cref="DescentSolution.WallPowerSufficient"/> is false (MODEL).</item>
/// <item>Stall: when head plus wall power is at most C·Φ (C the capacitance of the prolate spheroid with semi-axes
/// ℓ/2 and R), the probe cannot hold its surface at T_m, does not move, and all power is conducted away (MODEL after
/// Lorenz 2012). The transition between the two branches is not resolved.</item>
/// </list>
/// </remarks>
public static class SteadyDescent
{
    private const string Model = "the steady descent model";

    /// <summary>Default water gap around the body, 0.5 mm (about the melt film; the reference note's clearance without side heaters).</summary>
    public const double DefaultDesignGapM = 0.5e-3;

    /// <summary>Largest salt depression of the melting point accepted: 3 K, about seawater's freezing point at 40 g/kg (UNESCO 1983).</summary>
    private const double MaximumSaltDepressionK = 3.0;

    /// <param name="geometry">Radius, length and mass of the probe.</param>
    /// <param name="headPowerW">Heater power delivered to the head.</param>
    /// <param name="wallPowerW">Heater power delivered to the side walls.</param>
    /// <param name="farFieldTemperatureK">Temperature of the undisturbed ice.</param>
    /// <param name="pressurePa">Pressure in the melt (at least the triple-point pressure).</param>
    /// <param name="gravityMPerS2">The body's gravity, for the probe's load on its melt film.</param>
    /// <param name="meltingTemperatureK">
    /// Melting point of the ice being cut; default the pure-ice curve at <paramref name="pressurePa"/>. Salt lowers it
    /// (see <see cref="Shell.SalineIce"/>): less sensible heat per kilogram, and the latent heat of the ice matrix unchanged (MODEL).
    /// </param>
    /// <param name="designGapM">Water gap around the body where nothing froze or melted (see <see cref="SideBalance"/>).</param>
    /// <param name="headHeatsBody">
    /// True for a body that carries the head's heat to its whole wall (fluid-filled or heat-pipe bodies, as in Aamot's
    /// analysis of the Philberth probe): the side's shortfall is paid from the head before it melts ahead, and the wall
    /// stays at T_m. False (the simulator's probes) when only the film and the wall heaters reach the side.
    /// </param>
    public static DescentSolution Solve(ProbeGeometry geometry, double headPowerW, double wallPowerW, double farFieldTemperatureK, double pressurePa, double gravityMPerS2, double? meltingTemperatureK = null, double designGapM = DefaultDesignGapM, bool headHeatsBody = false)
    {
        ArgumentNullException.ThrowIfNull(geometry);
        var radiusM = ValidRange.RequirePositive(geometry.RadiusM, nameof(geometry.RadiusM), "m", Model);
        var lengthM = ValidRange.RequirePositive(geometry.LengthM, nameof(geometry.LengthM), "m", Model);
        ValidRange.RequirePositive(geometry.MassKg, nameof(geometry.MassKg), "kg", Model);
        ValidRange.Require(headPowerW, 0.0, 1e9, nameof(headPowerW), "W", Model);
        ValidRange.Require(wallPowerW, 0.0, 1e9, nameof(wallPowerW), "W", Model);
        ValidRange.Require(pressurePa, TriplePoint.PressurePa, FusionLatentHeat.MaximumPressurePa, nameof(pressurePa), "Pa", Model + " (liquid meltwater needs p ≥ p_t; latent heat trusted to 50 MPa)");
        ValidRange.Require(gravityMPerS2, 1e-3, 30.0, nameof(gravityMPerS2), "m/s²", Model);

        var pureMeltingK = MeltingCurve.TemperatureK(pressurePa);
        var meltingK = meltingTemperatureK is { } given
            ? ValidRange.Require(given, pureMeltingK - MaximumSaltDepressionK, pureMeltingK, nameof(meltingTemperatureK), "K", Model + " (at most the pure-ice melting point, salt lowering it by at most 3 K)")
            : pureMeltingK;
        ValidRange.Require(farFieldTemperatureK, IceConductivity.MinimumTemperatureK(IceConductivityFit.PetrenkoWhitworth1999), meltingK, nameof(farFieldTemperatureK), "K", Model + " (ice below its melting point)");

        var loadN = (geometry.MassKg - (LiquidWater.DensityKgPerM3 * geometry.VolumeM3)) * gravityMPerS2;
        if (loadN <= 0)
        {
            throw new ArgumentOutOfRangeException(
                nameof(geometry),
                geometry,
                FormattableString.Invariant($"The probe's net load {loadN:R} N is outside the valid range (0, +inf) N of {Model}: a probe lighter than the water it displaces floats off the ice."));
        }

        var iceDensity = IceIh.DensityKgPerM3(farFieldTemperatureK, pressurePa);
        var sensiblePerKg = IceIh.SensibleHeatJPerKg(farFieldTemperatureK, meltingK, pressurePa);
        var latentPerKg = FusionLatentHeat.AtPressureJPerKg(pressurePa);
        var phi = IceConductivity.KirchhoffPotentialWPerM(farFieldTemperatureK, meltingK, IceConductivityFit.PetrenkoWhitworth1999);
        var area = geometry.HeadAreaM2;
        var idealVelocity = headPowerW / (area * iceDensity * (latentPerKg + sensiblePerKg));

        var stallPower = StallLimit.StallPowerW(StallLimit.ProbeCapacitanceM(radiusM, lengthM), phi);
        var totalIn = headPowerW + wallPowerW;
        if (headPowerW == 0 || totalIn <= stallPower)
        {
            return new DescentSolution(0.0, 0.0, 0.0, totalIn, headPowerW, wallPowerW, 0.0, false)
            {
                LateralDemandW = stallPower,
                RequiredWallPowerW = headPowerW == 0 ? double.PositiveInfinity : Math.Max(0, stallPower - headPowerW),
                IdealVelocityMPerS = idealVelocity,
                Stalled = true,
            };
        }

        var boilingK = BoilingCurve.TemperatureK(Math.Max(pressurePa, BoilingCurve.MinimumPressurePa));
        var maximumSuperheatK = Math.Max(0.0, boilingK - meltingK);
        var kappa = LateralConduction.EffectiveDiffusivityM2PerS(phi, iceDensity, sensiblePerKg);
        var meltEnthalpy = latentPerKg + sensiblePerKg;
        ValidRange.RequireNonNegative(designGapM, nameof(designGapM), "m", Model);

        // The head melts with what is left after the body's share (only when the body carries head heat to its wall).
        BoundedHeadSolution Head(double meltingPowerW) => BoilingBoundedHead.Solve(meltingPowerW, radiusM, loadN, iceDensity, meltEnthalpy, maximumSuperheatK);
        double FilmHeatW(BoundedHeadSolution h) =>
            (iceDensity * area * h.Film.VelocityMPerS * CloseContactMelting.DefaultSuperheatFraction * LiquidWater.SpecificHeatJPerKgK * h.Film.FilmSuperheatK) + h.BoilOffW;
        double BodyShareW(BoundedHeadSolution h) => h.Film.VelocityMPerS <= 0 ? double.PositiveInfinity
            : Math.Max(0.0, SideBalance.Solve(lengthM, radiusM, h.Film.VelocityMPerS, phi, kappa, iceDensity, latentPerKg, FilmHeatW(h), 0.0, designGapM).RequiredSideHeatW - FilmHeatW(h) - wallPowerW);

        var meltingPowerW = headPowerW;
        if (headHeatsBody)
        {
            var share = BodyShareW(Head(headPowerW));
            if (share >= headPowerW) return StalledSolution(headPowerW, wallPowerW, stallPower, idealVelocity);
            if (share > 0)
            {
                // x + share(x) = P_h; share grows with x (a faster probe loses more), so the root is unique.
                double Residual(double x) => x + Math.Min(BodyShareW(Head(x)), 10 * headPowerW) - headPowerW;
                var lower = 1e-6 * headPowerW;
                if (Residual(lower) >= 0) return StalledSolution(headPowerW, wallPowerW, stallPower, idealVelocity);
                meltingPowerW = MathNet.Numerics.RootFinding.Brent.FindRoot(Residual, lower, headPowerW, 1e-9 * headPowerW, 200);
            }
        }

        var head = Head(meltingPowerW);
        if (head.Film.VelocityMPerS <= 0) return StalledSolution(headPowerW, wallPowerW, stallPower, idealVelocity);
        var massRate = iceDensity * area * head.Film.VelocityMPerS;
        var sensibleW = massRate * sensiblePerKg;
        var latentW = massRate * latentPerKg;
        var filmW = FilmHeatW(head);
        // With a body heated by the head, its share reaches the wall as wall heat.
        var bodyShareW = headPowerW - meltingPowerW;
        var sideWallW = wallPowerW + bodyShareW;

        var demand = LateralConduction.LossW(lengthM, head.Film.VelocityMPerS, radiusM, phi, kappa);
        var side = SideBalance.Solve(lengthM, radiusM, head.Film.VelocityMPerS, phi, kappa, iceDensity, latentPerKg, filmW, sideWallW, designGapM);
        var required = Math.Max(0.0, demand - filmW);
        var sufficient = sideWallW >= required;
        var lateral = sufficient ? demand : filmW + sideWallW;
        var surplus = filmW + sideWallW - lateral;

        return new DescentSolution(head.Film.VelocityMPerS, sensibleW, latentW, lateral, headPowerW, wallPowerW, head.Film.FilmThicknessM, sufficient)
        {
            FilmSuperheatW = filmW,
            WallSurplusW = surplus,
            LateralDemandW = demand,
            RequiredWallPowerW = required,
            HeadSuperheatK = head.Film.FilmSuperheatK,
            IdealVelocityMPerS = idealVelocity,
            BoilingTemperatureK = boilingK,
            BoilOffW = head.BoilOffW,
            BodyShareW = bodyShareW,
            Side = side,
            Stalled = false,
        };
    }

    private static DescentSolution StalledSolution(double headPowerW, double wallPowerW, double stallPower, double idealVelocity) =>
        new(0.0, 0.0, 0.0, headPowerW + wallPowerW, headPowerW, wallPowerW, 0.0, false)
        {
            LateralDemandW = stallPower,
            RequiredWallPowerW = Math.Max(0, stallPower - headPowerW),
            IdealVelocityMPerS = idealVelocity,
            Stalled = true,
        };
}
