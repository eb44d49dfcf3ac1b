using DescentOps.Primitives.Time;

namespace DescentOps.Engine.Tests;

public sealed class SimTimeArithmeticTests
{
    [Fact]
    public void An_instant_plus_a_duration_is_the_sum_of_their_ticks()
    {
        // 90 s after T+10 s is T+100 s: 10e6 + 90e6 = 100e6 ticks of one microsecond.
        var later = SimTime.FromSecondsSinceEpoch(10) + SimDuration.FromSeconds(90);

        Assert.Equal(100_000_000L, later.Ticks);
    }

    [Fact]
    public void The_difference_of_two_instants_is_a_duration_that_adds_back()
    {
        var a = SimTime.FromSecondsSinceEpoch(7.25);
        var b = SimTime.FromSecondsSinceEpoch(2);

        var gap = a - b;

        // 7.25 s - 2 s = 5.25 s = 5,250,000 ticks.
        Assert.Equal(5_250_000L, gap.Ticks);
        Assert.Equal(a, b + gap);
        Assert.Equal(b, a - gap);
    }

    [Fact]
    public void Minutes_hours_and_days_convert_to_whole_seconds_of_ticks()
    {
        Assert.Equal(60L * SimDuration.TicksPerSecond, SimDuration.FromMinutes(1).Ticks);
        Assert.Equal(3_600L * SimDuration.TicksPerSecond, SimDuration.FromHours(1).Ticks);
        Assert.Equal(86_400L * SimDuration.TicksPerSecond, SimDuration.FromDays(1).Ticks);
        Assert.Equal(1.5, SimDuration.FromHours(36).TotalDays); // 36 h / 24 h
    }

    [Theory]
    // Each product seconds * 1e6 is exactly the half-tick shown (checked in binary64), so only the rounding rule decides.
    [InlineData(0.5e-6, 0L)] // 0.5 tick rounds to the even 0
    [InlineData(1.5e-6, 2L)] // 1.5 ticks round to the even 2
    [InlineData(2.5e-6, 2L)] // 2.5 ticks round to the even 2, not away to 3
    [InlineData(-1.5e-6, -2L)] // symmetric below zero
    [InlineData(0.7e-6, 1L)] // not a tie: the nearest tick
    public void Seconds_round_to_the_nearest_tick_with_ties_to_even(double seconds, long expectedTicks)
    {
        Assert.Equal(expectedTicks, SimDuration.FromSeconds(seconds).Ticks);
    }

    [Theory]
    [InlineData(double.NaN)]
    [InlineData(double.PositiveInfinity)]
    [InlineData(double.NegativeInfinity)]
    [InlineData(1e13)] // past long.MaxValue / 1e6 ≈ 9.22e12 s
    [InlineData(-1e13)]
    public void Seconds_that_do_not_fit_the_tick_range_are_refused(double seconds)
    {
        Assert.ThrowsAny<ArgumentOutOfRangeException>(() => SimDuration.FromSeconds(seconds));
    }

    [Fact]
    public void Adding_past_the_end_of_time_throws_instead_of_wrapping()
    {
        Assert.Throws<OverflowException>(() => SimTime.MaxValue + new SimDuration(1));
        Assert.Throws<OverflowException>(() => SimDuration.MaxValue + new SimDuration(1));
        Assert.Throws<OverflowException>(() => SimDuration.MaxValue * 2);
        Assert.Throws<OverflowException>(() => -new SimDuration(long.MinValue));
        Assert.Throws<OverflowException>(() => new SimTime(long.MinValue) - new SimDuration(1));
    }

    [Fact]
    public void Instants_and_durations_order_by_their_ticks()
    {
        Assert.True(new SimTime(1) < new SimTime(2));
        Assert.True(new SimDuration(-1) < SimDuration.Zero);
        Assert.Equal(new SimTime(1), SimTime.Min(new SimTime(1), new SimTime(2)));
        Assert.Equal(new SimTime(2), SimTime.Max(new SimTime(1), new SimTime(2)));
    }

    [Fact]
    public void Durations_print_in_invariant_round_trip_seconds()
    {
        // 1,500,000 ticks = 1.5 s, with a point whatever the culture.
        Assert.Equal("1.5 s", new SimDuration(1_500_000).ToString());
        Assert.Equal("T+1.5 s", new SimTime(1_500_000).ToString());
    }
}
