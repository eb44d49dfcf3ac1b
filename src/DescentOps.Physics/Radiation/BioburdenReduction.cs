namespace DescentOps.Physics.Radiation;

/// <summary>
/// Log-linear kill of spores on hardware: each D-value of exposure (time at a sterilising temperature, or dose)
/// divides the surviving population by ten, N = N0·10^(−exposure/D). First-order kinetics is the textbook model
/// (RULE); tailing of resistant fractions is not modelled.
/// </summary>
public static class BioburdenReduction
{
    private const string Model = "the D-value bioburden reduction";

    /// <summary>Decimal log reduction from a dry-heat exposure time and the D-value at that temperature.</summary>
    public static double LogReductionFromHeat(double exposureS, double dValueS)
    {
        ValidRange.RequireNonNegative(exposureS, nameof(exposureS), "s", Model);
        ValidRange.RequirePositive(dValueS, nameof(dValueS), "s", Model);
        return exposureS / dValueS;
    }

    /// <summary>Decimal log reduction from an absorbed dose and the radiation D-value (D10).</summary>
    public static double LogReductionFromDose(double doseGy, double dValueGy)
    {
        ValidRange.RequireNonNegative(doseGy, nameof(doseGy), "Gy", Model);
        ValidRange.RequirePositive(dValueGy, nameof(dValueGy), "Gy", Model);
        return doseGy / dValueGy;
    }

    /// <summary>Surviving population after a log reduction.</summary>
    public static double SurvivingPopulation(double initialPopulation, double logReduction)
    {
        ValidRange.RequireNonNegative(initialPopulation, nameof(initialPopulation), "(spores)", Model);
        ValidRange.RequireNonNegative(logReduction, nameof(logReduction), "(decades)", Model);
        return initialPopulation * Math.Pow(10.0, -logReduction);
    }
}
