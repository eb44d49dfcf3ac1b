using DescentOps.Mission.Onboard;

namespace DescentOps.Mission.Tests.Onboard;

/// <summary>The crossing finder against crossings computed by hand (a line, a monotone curve), tick for tick.</summary>
public sealed class CrossingFinderTests
{
    [Theory]
    [InlineData(2.6e-4, 999.9, 1000.0)]    // a melt probe's speed: 0.1 m at 0.26 mm/s
    [InlineData(1e-9, 0.0, 1e-6)]          // a slow drift
    [InlineData(-3e-5, 0.8, 0.3)]          // a falling charge
    public void A_linear_value_crosses_at_the_first_tick_past_the_limit(double ratePerS, double start, double limit)
    {
        double ValueAt(long tick) => start + (ratePerS * tick / 1e6);
        // Computed: the root (limit - start) / rate in ticks; the first tick strictly past it is its floor + 1 (or the
        // root itself when it is a whole tick and the value there is past the limit, which it is not: equal is not past).
        var root = (limit - start) / ratePerS * 1e6;
        var found = CrossingFinder.FirstTickPast(ValueAt, 0, (long)(root * 2) + 10, limit);
        Assert.NotNull(found);
        Assert.NotEqual(LimitSide.Of(ValueAt(0), limit), LimitSide.Of(ValueAt(found.Value), limit));
        Assert.Equal(LimitSide.Of(ValueAt(0), limit), LimitSide.Of(ValueAt(found.Value - 1), limit));
        Assert.InRange(found.Value - root, 0, 1.0 + 1e-6);
    }

    [Fact]
    public void A_monotone_curve_crosses_where_its_inverse_says()
    {
        // T = 100 K · (1 + t / 1 s)^(1/2) reaches 250 K at t = (2.5² − 1) s = 5.25 s, where it is exactly on the limit
        // (sqrt(6.25) = 2.5 in binary floating point): that tick is the first not below it. A limit check made there
        // sees "on the limit" (not above), and the next crossing, one tick on, is found from there.
        double ValueAt(long tick) => 100.0 * Math.Sqrt(1 + (tick / 1e6));
        Assert.Equal(5_250_000, CrossingFinder.FirstTickPast(ValueAt, 0, 20_000_000, 250.0));
        Assert.Equal(5_250_001, CrossingFinder.FirstTickPast(ValueAt, 5_250_000, 20_000_000, 250.0));
        Assert.Equal(5_250_000, CrossingFinder.FirstTickPast(ValueAt, 0, 20_000_000, 250.0 - 1e-9));
    }

    [Fact]
    public void No_crossing_inside_the_bracket_is_none()
    {
        Assert.Null(CrossingFinder.FirstTickPast(t => t, 0, 1000, 5000));
        Assert.Null(CrossingFinder.FirstTickPast(_ => 3.0, 0, 1000, 2.0));
        Assert.Null(CrossingFinder.FirstTickPast(t => t, 10, 10, 5));
    }

    [Fact]
    public void A_value_on_the_limit_crosses_at_the_first_tick_it_leaves_it()
    {
        Assert.Equal(1, CrossingFinder.FirstTickPast(t => t, 0, 1000, 0.0));
    }

    [Fact]
    public void The_sample_grid_rounds_up_to_whole_intervals_from_the_start()
    {
        var grid = new SampleGrid(1_000_000);
        Assert.Equal(0, grid.AtOrAfter(new(0)).Ticks);
        Assert.Equal(1_000_000, grid.AtOrAfter(new(1)).Ticks);
        Assert.Equal(1_000_000, grid.AtOrAfter(new(1_000_000)).Ticks);
        Assert.Equal(2_000_000, grid.After(new(1_000_000)).Ticks);
        Assert.Equal(1_000_000, grid.After(new(999_999)).Ticks);
    }
}
