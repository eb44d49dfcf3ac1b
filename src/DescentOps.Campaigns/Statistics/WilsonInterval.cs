using MathNet.Numerics.Distributions;

namespace DescentOps.Campaigns.Statistics;

/// <summary>
/// The Wilson score interval for a binomial proportion (Wilson 1927, "Probable inference, the law of succession, and
/// statistical inference", JASA 22:209-212): the p whose score test at level alpha does not reject,
/// (p̂ + z²/2n ± z·sqrt(p̂(1−p̂)/n + z²/4n²)) / (1 + z²/n). Newcombe 1998 ("Two-sided confidence intervals for the single
/// proportion: comparison of seven methods", Statistics in Medicine 17:857-872) calls it method 3.
/// </summary>
public static class WilsonInterval
{
    /// <summary>z for a two-sided 95 % interval, the 0.975 quantile of the standard normal.</summary>
    public static readonly double Z95 = Normal.InvCDF(0, 1, 0.975);

    public static (double Low, double High) Compute(long successes, long n, double z)
    {
        if (n <= 0) return (0, 1);
        var p = successes / (double)n;
        var z2 = z * z;
        var denominator = 1 + (z2 / n);
        var centre = (p + (z2 / (2.0 * n))) / denominator;
        var half = z * Math.Sqrt((p * (1 - p) / n) + (z2 / (4.0 * n * n))) / denominator;
        // The exact ends at 0 and n, where rounding could leave a hair's breadth.
        return (successes == 0 ? 0 : Math.Max(0, centre - half), successes == n ? 1 : Math.Min(1, centre + half));
    }

    public static (double Low, double High) Compute95(long successes, long n) => Compute(successes, n, Z95);
}
