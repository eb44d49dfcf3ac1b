using MathNet.Numerics.Distributions;

namespace DescentOps.Campaigns.Statistics;

/// <summary>
/// A quantile of a sample with a distribution-free confidence interval from order statistics (e.g. Conover 1999,
/// "Practical Nonparametric Statistics", 3rd ed., section 3.2): the number of observations below the true p-quantile is
/// Binomial(n, p), so [x(r), x(s)] covers it with probability F(s−1) − F(r−1). We take r the largest rank with
/// F(r−1) ≤ α/2 and s the smallest with F(s−1) ≥ 1 − α/2, which covers at least 1 − α; an end that falls outside
/// the sample is null (the sample is too small for it). The point estimate is MathNet's R-8 quantile.
/// Runs that never reached a value (no breakthrough) enter as +∞, so a quantile among them is null.
/// </summary>
public static class QuantileInterval
{
    public static (double? Estimate, double? Low, double? High) Compute(IReadOnlyList<double> values, double p, double alpha = 0.05)
    {
        var n = values.Count;
        if (n == 0) return (null, null, null);
        var sorted = values.OrderBy(v => v).ToArray();
        var estimate = MathNet.Numerics.Statistics.SortedArrayStatistics.QuantileCustom(sorted, p, MathNet.Numerics.Statistics.QuantileDefinition.R8);
        int? r = null;
        for (var k = 1; k <= n; k++)
        {
            if (Binomial.CDF(p, n, k - 1) <= alpha / 2) r = k;
            else break;
        }

        int? s = null;
        for (var k = 1; k <= n; k++)
        {
            if (Binomial.CDF(p, n, k - 1) >= 1 - (alpha / 2))
            {
                s = k;
                break;
            }
        }

        static double? Finite(double v) => double.IsFinite(v) ? v : null;
        return (Finite(estimate), r is { } low ? Finite(sorted[low - 1]) : null, s is { } high ? Finite(sorted[high - 1]) : null);
    }
}
