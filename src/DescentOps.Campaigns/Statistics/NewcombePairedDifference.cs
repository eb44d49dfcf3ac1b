namespace DescentOps.Campaigns.Statistics;

/// <summary>
/// The interval for the difference of two paired proportions by Newcombe 1998 ("Improved confidence intervals for the
/// difference between binomial proportions based on paired data", Statistics in Medicine 17:2635-2650), method 10: the
/// Wilson intervals (l1, u1) and (l2, u2) of the two marginal proportions combined with the correlation of the pairs,
/// θ̂ − sqrt((p1−l1)² − 2φ(p1−l1)(u2−p2) + (u2−p2)²) to θ̂ + sqrt((p2−l2)² − 2φ(p2−l2)(u1−p1) + (u1−p1)²), where
/// φ = C / sqrt((a+b)(c+d)(a+c)(b+d)) and C = ad − bc − n/2 when ad − bc exceeds n/2, ad − bc when it is negative, else 0.
/// Cells: a both succeed, b only the first, c only the second, d neither; θ̂ = (b − c)/n.
/// </summary>
public static class NewcombePairedDifference
{
    public static (double Difference, double Low, double High) Compute(long a, long b, long c, long d, double z)
    {
        var n = a + b + c + d;
        if (n == 0) return (0, -1, 1);
        var p1 = (a + b) / (double)n;
        var p2 = (a + c) / (double)n;
        var (l1, u1) = WilsonInterval.Compute(a + b, n, z);
        var (l2, u2) = WilsonInterval.Compute(a + c, n, z);
        var product = (double)(a + b) * (c + d) * (a + c) * (b + d);
        var cross = ((double)a * d) - ((double)b * c);
        var corrected = cross > n / 2.0 ? cross - (n / 2.0) : cross < 0 ? cross : 0;
        var phi = product > 0 ? corrected / Math.Sqrt(product) : 0;
        var theta = p1 - p2;
        var low = theta - Math.Sqrt(Math.Max(0, Sq(p1 - l1) - (2 * phi * (p1 - l1) * (u2 - p2)) + Sq(u2 - p2)));
        var high = theta + Math.Sqrt(Math.Max(0, Sq(p2 - l2) - (2 * phi * (p2 - l2) * (u1 - p1)) + Sq(u1 - p1)));
        return (theta, Math.Max(-1, low), Math.Min(1, high));
    }

    public static (double Difference, double Low, double High) Compute95(long a, long b, long c, long d) => Compute(a, b, c, d, WilsonInterval.Z95);

    private static double Sq(double x) => x * x;
}
