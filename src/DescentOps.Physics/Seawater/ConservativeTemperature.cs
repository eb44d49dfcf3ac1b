namespace DescentOps.Physics.Seawater;

/// <summary>
/// Potential and Conservative Temperature of TEOS-10 from in-situ temperature, and back. The potential temperature θ
/// (reference sea pressure 0) has the entropy of the in-situ state; Conservative Temperature is the potential enthalpy
/// over c_p0 = 3991.86795711963 J/(kg K), Θ = h(S_A, θ, 0)/c_p0 (IOC, SCOR and IAPSO 2010, sections 3.1–3.3).
/// Both equations are solved by Newton's method on the Gibbs function, to 1e-10 K.
/// </summary>
public static class ConservativeTemperature
{
    /// <summary>The TEOS-10 heat capacity that scales potential enthalpy into Conservative Temperature, J/(kg K).</summary>
    public const double ReferenceHeatCapacityJPerKgK = 3991.86795711963;

    private const double ToleranceK = 1e-10;
    private const int MaximumIterations = 30;

    public static double PotentialTemperatureK(double absoluteSalinityGPerKg, double temperatureK, double seaPressurePa)
    {
        var entropy = SeawaterGibbsFunction.Evaluate(absoluteSalinityGPerKg, temperatureK, seaPressurePa).EntropyJPerKgK;
        return TemperatureWithEntropy(absoluteSalinityGPerKg, entropy, 0.0, temperatureK);
    }

    public static double FromInSituK(double absoluteSalinityGPerKg, double temperatureK, double seaPressurePa)
    {
        var theta = PotentialTemperatureK(absoluteSalinityGPerKg, temperatureK, seaPressurePa);
        return FromPotentialK(absoluteSalinityGPerKg, theta);
    }

    public static double FromPotentialK(double absoluteSalinityGPerKg, double potentialTemperatureK) =>
        SeawaterGibbsFunction.CelsiusZeroK
        + (SeawaterGibbsFunction.Evaluate(absoluteSalinityGPerKg, potentialTemperatureK, 0.0).EnthalpyJPerKg / ReferenceHeatCapacityJPerKgK);

    /// <summary>In-situ temperature of the state with this Conservative Temperature at this pressure.</summary>
    public static double ToInSituK(double absoluteSalinityGPerKg, double conservativeTemperatureK, double seaPressurePa)
    {
        // θ from Θ: h(S_A, θ, 0) = c_p0·Θ with ∂h/∂θ = c_p.
        var targetEnthalpy = (conservativeTemperatureK - SeawaterGibbsFunction.CelsiusZeroK) * ReferenceHeatCapacityJPerKgK;
        var theta = conservativeTemperatureK;
        for (var n = 0; n < MaximumIterations; n++)
        {
            var at = SeawaterGibbsFunction.Evaluate(absoluteSalinityGPerKg, theta, 0.0);
            var step = (at.EnthalpyJPerKg - targetEnthalpy) / at.SpecificHeatJPerKgK;
            theta -= step;
            if (Math.Abs(step) < ToleranceK) break;
        }

        var entropy = SeawaterGibbsFunction.Evaluate(absoluteSalinityGPerKg, theta, 0.0).EntropyJPerKgK;
        return TemperatureWithEntropy(absoluteSalinityGPerKg, entropy, seaPressurePa, theta);
    }

    // s(S_A, T, p) = s_target, with ∂s/∂T = −g_TT.
    private static double TemperatureWithEntropy(double absoluteSalinityGPerKg, double entropyJPerKgK, double seaPressurePa, double startK)
    {
        var temperature = startK;
        for (var n = 0; n < MaximumIterations; n++)
        {
            var at = SeawaterGibbsFunction.Evaluate(absoluteSalinityGPerKg, temperature, seaPressurePa);
            var step = (at.EntropyJPerKgK - entropyJPerKgK) / -at.GttJPerKgK2;
            temperature -= step;
            if (Math.Abs(step) < ToleranceK) break;
        }

        return temperature;
    }
}
