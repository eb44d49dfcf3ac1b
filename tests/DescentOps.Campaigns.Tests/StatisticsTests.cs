using System.Numerics;
using DescentOps.Campaigns.Statistics;
using Xunit;

namespace DescentOps.Campaigns.Tests;

public sealed class StatisticsTests
{
    /// <summary>
    /// Newcombe 1998, "Two-sided confidence intervals for the single proportion: comparison of seven methods",
    /// Statistics in Medicine 17:857-872, Table I, method 3 (Wilson score, no continuity correction), to the 4 decimals
    /// printed there (values from memory of that table).
    /// </summary>
    [Theory]
    [InlineData(81, 263, 0.2553, 0.3662)]
    [InlineData(15, 148, 0.0624, 0.1605)]
    [InlineData(0, 20, 0.0000, 0.1611)]
    [InlineData(1, 29, 0.0061, 0.1718)]
    public void Wilson_matches_newcombes_table(int successes, int n, double low, double high)
    {
        var (l, h) = WilsonInterval.Compute95(successes, n);
        Assert.Equal(low, l, 4);
        Assert.Equal(high, h, 4);
    }

    /// <summary>
    /// Newcombe 1998, "Improved confidence intervals for the difference between binomial proportions based on paired
    /// data", Statistics in Medicine 17:2635-2650, Table II, example (a) 36/12/2/0, method 10: 0.0569 to 0.3404
    /// (from memory of that table).
    /// </summary>
    [Fact]
    public void Paired_difference_matches_newcombes_example()
    {
        var (difference, low, high) = NewcombePairedDifference.Compute95(36, 12, 2, 0);
        Assert.Equal(0.2, difference, 12);
        Assert.Equal(0.0569, low, 4);
        Assert.Equal(0.3404, high, 4);
    }

    [Fact]
    public void Paired_difference_is_symmetric_and_holds_its_estimate()
    {
        // Computed: swapping the variants negates the difference and mirrors the interval.
        var (d1, l1, h1) = NewcombePairedDifference.Compute95(59, 6, 16, 80);
        var (d2, l2, h2) = NewcombePairedDifference.Compute95(59, 16, 6, 80);
        Assert.Equal(-d1, d2, 12);
        Assert.Equal(-h1, l2, 12);
        Assert.Equal(-l1, h2, 12);
        Assert.InRange(d1, l1, h1);
    }

    /// <summary>
    /// Fagerland, Lydersen and Laake 2013, "The McNemar test for binary matched-pairs data: mid-p and asymptotic are
    /// better than exact conditional", BMC Medical Research Methodology 13:91: the airway hyper-responsiveness example
    /// (Bentur et al. 2009) has 1 and 7 discordant pairs and an exact conditional p-value of 0.070 (from memory).
    /// </summary>
    [Fact]
    public void McNemar_matches_the_textbook_example() => Assert.Equal(0.070, McNemarExact.PValue(1, 7), 3);

    [Theory]
    [InlineData(0, 0)]
    [InlineData(3, 3)]
    [InlineData(2, 10)]
    [InlineData(15, 4)]
    [InlineData(0, 25)]
    [InlineData(40, 61)]
    public void McNemar_equals_the_direct_binomial_sum(int b, int c)
    {
        // Computed: 2 * sum_{k <= min(b, c)} C(n, k) / 2^n, exactly in integers, capped at 1.
        var n = b + c;
        var tail = BigInteger.Zero;
        var term = BigInteger.One;
        for (var k = 0; k <= Math.Min(b, c); k++)
        {
            tail += term;
            term = term * (n - k) / (k + 1);
        }

        var expected = Math.Min(1, 2 * (double)tail / Math.Pow(2, n));
        Assert.Equal(expected, McNemarExact.PValue(b, c), 12);
    }

    [Fact]
    public void Median_interval_uses_the_binomial_ranks()
    {
        // Computed: for n = 20, P(Bin(20, 1/2) <= 5) = 0.0207 <= 0.025 < P(<= 6) = 0.0577, and P(<= 14) = 0.9793 >= 0.975,
        // so the interval is [x(6), x(15)] (Conover 1999, section 3.2, gives the same ranks for n = 20).
        var values = Enumerable.Range(1, 20).Select(i => (double)i * 10).ToList();
        var (estimate, low, high) = QuantileInterval.Compute(values, 0.5);
        Assert.Equal(105, estimate!.Value, 9);
        Assert.Equal(60, low);
        Assert.Equal(150, high);
    }

    [Fact]
    public void A_quantile_among_runs_that_never_got_there_is_null()
    {
        var values = new List<double> { 1, 2, double.PositiveInfinity, double.PositiveInfinity, double.PositiveInfinity };
        Assert.Null(QuantileInterval.Compute(values, 0.9).Estimate);
    }

    /// <summary>SplitMix64's published test vector: seeded with 1234567 it gives 6457827717110365317 first (Vigna's splitmix64.c; from memory).</summary>
    [Fact]
    public void Run_seeds_are_SplitMix64_outputs()
    {
        Assert.Equal(6457827717110365317UL, unchecked((ulong)RunSeeds.ForRun(1234567, 0)));
        Assert.Equal(3203168211198807973UL, unchecked((ulong)RunSeeds.ForRun(1234567, 1)));
        Assert.Equal(1000, Enumerable.Range(0, 1000).Select(i => RunSeeds.ForRun(7, i)).Distinct().Count());
    }
}
