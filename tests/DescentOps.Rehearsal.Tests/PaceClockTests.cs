
namespace DescentOps.Rehearsal.Tests;

public sealed class PaceClockTests
{
    [Fact]
    public void Simulated_time_runs_at_the_pace_and_stands_still_while_paused()
    {
        // Worked by hand: from 100 s at 3600 s/s, 2.5 wall seconds later the clock reads 100 + 9000 s.
        var clock = new PaceClock(100, 3600, paused: false, wallS: 10);
        Assert.Equal(9100, clock.SimAt(12.5), 9);
        clock.Pause(12.5);
        Assert.Equal(9100, clock.SimAt(20), 9);
        clock.Resume(20);
        Assert.Equal(9100 + 3600, clock.SimAt(21), 9);
        clock.SetPace(60, 21);
        Assert.Equal(12700 + 120, clock.SimAt(23), 9);
    }

    [Theory]
    [InlineData(0)]
    [InlineData(-1)]
    [InlineData(double.NaN)]
    [InlineData(double.PositiveInfinity)]
    [InlineData(PaceClock.MaxPace * 2)]
    public void A_pace_outside_its_range_is_refused(double pace)
    {
        Assert.False(PaceClock.IsValidPace(pace));
        Assert.Throws<ArgumentOutOfRangeException>(() => new PaceClock(0, pace, false, 0));
    }
}
