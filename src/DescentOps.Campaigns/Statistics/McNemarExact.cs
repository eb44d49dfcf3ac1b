using MathNet.Numerics.Distributions;

namespace DescentOps.Campaigns.Statistics;

/// <summary>
/// McNemar's test (McNemar 1947, "Note on the sampling error of the difference between correlated proportions or
/// percentages", Psychometrika 12:153-157) in its exact binomial form: under no difference, each of the b + c discordant
/// pairs goes either way with probability 1/2, so the two-sided p-value is min(1, 2·P(X ≤ min(b, c))) with
/// X ~ Binomial(b + c, 1/2).
/// </summary>
public static class McNemarExact
{
    public static double PValue(long b, long c)
    {
        var n = b + c;
        if (n == 0) return 1;
        return Math.Min(1, 2 * Binomial.CDF(0.5, (int)n, Math.Min(b, c)));
    }
}
