using DescentOps.Physics.Refreezing;

namespace DescentOps.Physics.Descent;

/// <summary>
/// Hot-water jet mode by the energy balance of hot-water drilling: the share η of the jet's heat that reaches the ice
/// melts a hole of radius R_h at speed v, η P = π R_h² v ρ_i (L + Δh_s) (the balance behind hot-water drill design,
/// e.g. Humphrey and Echelmeyer 1990, J. Glaciol. 36(124); Greenler et al. 2014, Ann. Glaciol. 55(68)). For a given
/// power a wider hole means a slower descent; for a given hole more power means a faster one. The water left in the
/// clearance R_h − R freezes back by the project's Stefan model around a cylinder (<see cref="Refreeze"/>).
/// </summary>
/// <remarks>
/// MODEL: a uniform hole with the whole melting front fed by the jets; no nozzle hydraulics, no heat carried up the
/// hole by the return flow (that is what η &lt; 1 stands for). η = 0.8 is the project's rule of thumb from hot-water
/// drilling practice (reference note §4.6: 0.6–0.9); published field figures imply less for whole surface-based drill
/// systems with long hoses and reaming (see the tests).
/// </remarks>
public static class HotWaterJet
{
    /// <summary>Share of jet heat that melts the hole, rule of thumb (0.6–0.9 in hot-water drilling practice).</summary>
    public const double DefaultEfficiency = 0.8;

    private const string Model = "the hot-water jet energy balance";

    /// <summary>Radius of the hole the jet heat cuts at a speed.</summary>
    public static double HoleRadiusM(double jetHeatW, double speedMPerS, double farFieldTemperatureK, double meltingTemperatureK, double efficiency = DefaultEfficiency)
    {
        ValidRange.RequirePositive(jetHeatW, nameof(jetHeatW), "W", Model);
        ValidRange.RequirePositive(speedMPerS, nameof(speedMPerS), "m/s", Model);
        ValidRange.Require(efficiency, 0.0, 1.0, nameof(efficiency), "", Model);
        // v ∝ 1/R² at fixed power: the speed of a 1 m hole gives the radius at any other speed.
        var speedOfUnitHole = IdealMeltRate.VelocityMPerS(jetHeatW, 1.0, farFieldTemperatureK, meltingTemperatureK, efficiency);
        return Math.Sqrt(speedOfUnitHole / speedMPerS);
    }

    /// <summary>Speed at which the jet heat cuts a hole of a radius.</summary>
    public static double SpeedMPerS(double jetHeatW, double holeRadiusM, double farFieldTemperatureK, double meltingTemperatureK, double efficiency = DefaultEfficiency)
    {
        ValidRange.RequirePositive(jetHeatW, nameof(jetHeatW), "W", Model);
        ValidRange.RequirePositive(holeRadiusM, nameof(holeRadiusM), "m", Model);
        ValidRange.Require(efficiency, 0.0, 1.0, nameof(efficiency), "", Model);
        return IdealMeltRate.VelocityMPerS(jetHeatW, holeRadiusM, farFieldTemperatureK, meltingTemperatureK, efficiency);
    }

    /// <summary>
    /// The operating point of a probe of radius R and length ℓ that cuts a hole of the given radius (at least the
    /// minimum hole radius, and wider than the probe): speed, clearance and freeze-back time of the clearance if the
    /// probe stopped, with the wall warmed for the time the probe's length takes to pass (ℓ/v).
    /// </summary>
    public static JetOperatingPoint At(double jetHeatW, double holeRadiusM, double minimumHoleRadiusM, double probeRadiusM, double probeLengthM,
        double farFieldTemperatureK, double meltingTemperatureK, double efficiency = DefaultEfficiency)
    {
        ValidRange.RequirePositive(probeRadiusM, nameof(probeRadiusM), "m", Model);
        ValidRange.RequirePositive(probeLengthM, nameof(probeLengthM), "m", Model);
        ValidRange.Require(minimumHoleRadiusM, probeRadiusM, double.PositiveInfinity, nameof(minimumHoleRadiusM), "m", Model);
        ValidRange.Require(holeRadiusM, minimumHoleRadiusM, double.PositiveInfinity, nameof(holeRadiusM), "m", Model);
        var speed = SpeedMPerS(jetHeatW, holeRadiusM, farFieldTemperatureK, meltingTemperatureK, efficiency);
        var clearance = holeRadiusM - probeRadiusM;
        var freeze = clearance > 0
            ? Refreeze.FreezeInAroundProbe(clearance, holeRadiusM, probeLengthM / speed, farFieldTemperatureK, meltingTemperatureK).FreezeTimeS
            : 0.0;
        return new JetOperatingPoint(holeRadiusM, speed, clearance, freeze);
    }
}
