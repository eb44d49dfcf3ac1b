using DescentOps.Physics.Water;
using MathNet.Numerics.RootFinding;

namespace DescentOps.Physics.Descent;

/// <summary>
/// Close-contact melting under a flat, uniformly heated head pressed on the ice by the probe's weight: the thin-film
/// lubrication balance for a disc (Lea 1976, J. Glaciol.; Moallemi, Webb and Viskanta 1986, J. Heat Transfer 108, 894;
/// applied to melt probes by Schüller and Kowalski 2017/2019), derived as in the reference note §4.2:
/// load F = (3π/2) μ_w v (ρ_i/ρ_w) R⁴/δ³, conduction across the film q = k_w ΔT_f/δ, and melting
/// q = ρ_i v (L + Δh_s + f c_w ΔT_f).
/// </summary>
/// <remarks>
/// MODEL choices: a flat disc (no nose shape); water properties constant at 0 °C (<see cref="LiquidWater"/>); the
/// fraction <c>f</c> of the film superheat carried out with the water defaults to ½ (the mean of a linear film
/// profile). Boiling in the film is not modelled.
/// </remarks>
public static class CloseContactMelting
{
    /// <summary>Default fraction of the film superheat that leaves with the meltwater (MODEL: mean of a linear profile).</summary>
    public const double DefaultSuperheatFraction = 0.5;

    /// <summary>
    /// Constant head power: solves the fixed point for ΔT_f with Brent's method on [0, ΔT_f(v0)] (the superheat cannot
    /// exceed the one at the ideal speed, since v ≤ v0).
    /// </summary>
    /// <param name="headFluxWPerM2">Head power over head area.</param>
    /// <param name="radiusM">Head radius.</param>
    /// <param name="loadN">Net load on the film (weight less buoyancy less tether tension); must be positive.</param>
    /// <param name="iceDensityKgPerM3">Density of the ice melted.</param>
    /// <param name="meltEnthalpyJPerKg">L + Δh_s per kilogram of ice.</param>
    /// <param name="superheatFraction">Fraction f of the film superheat leaving with the water.</param>
    public static CloseContactSolution AtConstantPower(double headFluxWPerM2, double radiusM, double loadN, double iceDensityKgPerM3, double meltEnthalpyJPerKg, double superheatFraction = DefaultSuperheatFraction)
    {
        const string model = "close-contact melting";
        ValidRange.RequirePositive(headFluxWPerM2, nameof(headFluxWPerM2), "W/m²", model);
        ValidRange.RequirePositive(radiusM, nameof(radiusM), "m", model);
        ValidRange.RequirePositive(loadN, nameof(loadN), "N", model);
        ValidRange.RequirePositive(iceDensityKgPerM3, nameof(iceDensityKgPerM3), "kg/m³", model);
        ValidRange.RequirePositive(meltEnthalpyJPerKg, nameof(meltEnthalpyJPerKg), "J/kg", model);
        ValidRange.Require(superheatFraction, 0.0, 1.0, nameof(superheatFraction), "", model);

        var r4 = Math.Pow(radiusM, 4);
        double Velocity(double superheatK) => headFluxWPerM2 / (iceDensityKgPerM3 * (meltEnthalpyJPerKg + (superheatFraction * LiquidWater.SpecificHeatJPerKgK * superheatK)));
        double Film(double v) => Math.Cbrt(3.0 * Math.PI * LiquidWater.ViscosityPaS * v * r4 * iceDensityKgPerM3 / (2.0 * loadN * LiquidWater.DensityKgPerM3));
        double Residual(double superheatK) => superheatK - (headFluxWPerM2 * Film(Velocity(superheatK)) / LiquidWater.ConductivityWPerMK);

        var upper = headFluxWPerM2 * Film(Velocity(0.0)) / LiquidWater.ConductivityWPerMK;
        var superheat = superheatFraction == 0.0 ? upper : Brent.FindRoot(Residual, 0.0, upper, 1e-12 * upper, 200);
        var velocity = Velocity(superheat);
        return new CloseContactSolution(velocity, Film(velocity), superheat);
    }

    /// <summary>
    /// Constant head temperature (superheat ΔT_f fixed, f = 0): v = [(2F/(3π μ_w R⁴))(ρ_w/ρ_i)(k_w ΔT_f/(ρ_i H))³]^(1/4).
    /// </summary>
    public static CloseContactSolution AtConstantSuperheat(double superheatK, double radiusM, double loadN, double iceDensityKgPerM3, double meltEnthalpyJPerKg)
    {
        const string model = "close-contact melting";
        ValidRange.RequirePositive(superheatK, nameof(superheatK), "K", model);
        ValidRange.RequirePositive(radiusM, nameof(radiusM), "m", model);
        ValidRange.RequirePositive(loadN, nameof(loadN), "N", model);
        var conductive = LiquidWater.ConductivityWPerMK * superheatK / (iceDensityKgPerM3 * meltEnthalpyJPerKg);
        var v = Math.Pow(2.0 * loadN / (3.0 * Math.PI * LiquidWater.ViscosityPaS * Math.Pow(radiusM, 4)) * (LiquidWater.DensityKgPerM3 / iceDensityKgPerM3) * conductive * conductive * conductive, 0.25);
        return new CloseContactSolution(v, conductive / v, superheatK);
    }
}
