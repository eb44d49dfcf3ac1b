using DescentOps.Physics.Ice;

namespace DescentOps.Physics.Vacuum;

/// <summary>
/// The near-surface regime of an airless body (pressure below the triple point): a heated head removes ice by
/// sublimation, not melting. Flux from Hertz–Knudsen–Langmuir, J = α_s (p_s(T_s) − p_v) √(M/(2π R_g T_s)), with
/// p_s from IAPWS R14-08; energy per kilogram = h_i(T_s) − h_i(T∞) (R10-06) + ΔH_sub(T_s) (Murphy and Koop 2005).
/// </summary>
/// <remarks>
/// MODEL/uncertain: the sublimation coefficient α_s ≤ 1 is poorly known (laboratory values ~0.1–1, from memory);
/// default 1, an upper bound. Heating of the escaping vapour is left out. Ice properties at zero pressure.
/// </remarks>
public static class VacuumSublimation
{
    /// <summary>Molar gas constant (CODATA 2018, exact).</summary>
    public const double GasConstantJPerMolK = 8.314462618;

    /// <summary>Surface temperatures searched for the head balance: the flux is negligible below 150 K.</summary>
    public const double MinimumSurfaceTemperatureK = 150.0;

    private const string Model = "the vacuum sublimation model";

    /// <summary>Net sublimation mass flux from a surface at T_s into vapour of partial pressure p_v.</summary>
    public static double MassFluxKgPerM2S(double surfaceTemperatureK, double sublimationCoefficient = 1.0, double ambientVapourPressurePa = 0.0)
    {
        ValidRange.Require(sublimationCoefficient, 1e-6, 1.0, nameof(sublimationCoefficient), "", Model);
        ValidRange.RequireNonNegative(ambientVapourPressurePa, nameof(ambientVapourPressurePa), "Pa", Model);
        var ps = SublimationCurve.PressurePa(surfaceTemperatureK);
        var m = SublimationEnthalpy.MolarMassKgPerMol;
        return sublimationCoefficient * (ps - ambientVapourPressurePa) * Math.Sqrt(m / (2.0 * Math.PI * GasConstantJPerMolK * surfaceTemperatureK));
    }

    /// <summary>Energy to remove a kilogram of ice at T∞ as vapour from a surface at T_s.</summary>
    public static double EnergyPerKgJ(double surfaceTemperatureK, double farFieldTemperatureK) =>
        IceIh.EnthalpyJPerKg(surfaceTemperatureK, 0.0) - IceIh.EnthalpyJPerKg(farFieldTemperatureK, 0.0)
        + SublimationEnthalpy.SpecificJPerKg(surfaceTemperatureK);

    /// <summary>
    /// Head surface temperature where sublimation carries away the head flux, J(T_s)·Δh_vac(T_s) = q_h, by bisection on
    /// [150 K, 273.16 K]; a flux that would need the triple point or more is outside this regime and refused.
    /// </summary>
    public static VacuumHeadSolution SolveHead(double headFluxWPerM2, double farFieldTemperatureK, double sublimationCoefficient = 1.0)
    {
        ValidRange.Require(farFieldTemperatureK, 0.0, TriplePoint.TemperatureK, nameof(farFieldTemperatureK), "K", Model);
        double Removed(double ts) => MassFluxKgPerM2S(ts, sublimationCoefficient) * EnergyPerKgJ(ts, farFieldTemperatureK);
        var minimum = Removed(MinimumSurfaceTemperatureK);
        var maximum = Removed(TriplePoint.TemperatureK);
        ValidRange.Require(headFluxWPerM2, minimum, maximum, nameof(headFluxWPerM2), "W/m²", Model + " (surface between 150 K and the triple point)");

        double low = MinimumSurfaceTemperatureK, high = TriplePoint.TemperatureK;
        for (var i = 0; i < 100 && high - low > 1e-10; i++)
        {
            var mid = 0.5 * (low + high);
            if (Removed(mid) < headFluxWPerM2) low = mid;
            else high = mid;
        }

        var surface = 0.5 * (low + high);
        var flux = MassFluxKgPerM2S(surface, sublimationCoefficient);
        return new VacuumHeadSolution(surface, flux, flux / IceIh.DensityKgPerM3(farFieldTemperatureK, 0.0), EnergyPerKgJ(surface, farFieldTemperatureK));
    }
}
