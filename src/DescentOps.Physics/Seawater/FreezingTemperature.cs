using DescentOps.Physics.Ice;

namespace DescentOps.Physics.Seawater;

/// <summary>
/// Freezing temperature of air-free seawater by TEOS-10: the temperature at which the chemical potential of water in
/// seawater, μ_W = g − S_A ∂g/∂S_A, equals the Gibbs energy of ice Ih (IAPWS R10-06) at the same absolute pressure
/// (IOC, SCOR and IAPSO 2010, section 3.33). Solved by Newton's method. No air is dissolved: the water under a shell on
/// an airless body has none to take up (dissolved air would lower the point by a few mK at most).
/// </summary>
public static class FreezingTemperature
{
    private const double ToleranceK = 1e-10;

    /// <summary>In-situ freezing temperature, K.</summary>
    public static double InSituK(double absoluteSalinityGPerKg, double seaPressurePa)
    {
        var absolutePa = seaPressurePa + SeawaterGibbsFunction.StandardAtmospherePa;
        // Start from a linear estimate (about −0.054 K per g/kg and −0.075 K per MPa); Newton needs three or four steps.
        var t = SeawaterGibbsFunction.CelsiusZeroK - (0.054 * absoluteSalinityGPerKg) - (7.5e-8 * seaPressurePa);
        for (var n = 0; n < 50; n++)
        {
            var water = SeawaterGibbsFunction.Evaluate(absoluteSalinityGPerKg, t, seaPressurePa);
            var ice = IceGibbsFunction.EvaluateUnchecked(t, absolutePa);
            var residual = water.WaterChemicalPotentialJPerKg - ice.GJPerKg;
            var slope = water.WaterChemicalPotentialSlopeJPerKgK - ice.GtJPerKgK;
            var step = residual / slope;
            t -= step;
            if (Math.Abs(step) < ToleranceK) break;
        }

        return t;
    }

    /// <summary>Conservative Temperature of seawater at its freezing point, K.</summary>
    public static double ConservativeK(double absoluteSalinityGPerKg, double seaPressurePa) =>
        ConservativeTemperature.FromInSituK(absoluteSalinityGPerKg, InSituK(absoluteSalinityGPerKg, seaPressurePa), seaPressurePa);
}
