using DescentOps.Mission.Ground;
using DescentOps.Primitives.Time;

namespace DescentOps.Mission.Tests.Ground;

/// <summary>The ground's hearing of its station, one transition at a time (a 600 s silence timeout, test input).</summary>
public sealed class StationWatchTests
{
    private static readonly SimDuration Timeout = SimDuration.FromSeconds(600);

    private static SimTime At(double seconds) => SimTime.FromSecondsSinceEpoch(seconds);

    [Fact]
    public void A_carrier_lost_with_home_in_view_becomes_a_death_only_after_the_timeout()
    {
        var silent = StationWatch.Start(true).Carrier(false, At(100), Timeout);
        Assert.Equal((true, At(700)), (silent.Alive, silent.SilenceEnds!.Value));

        Assert.Same(silent, silent.SilenceOver(At(650)));
        var dead = silent.SilenceOver(At(700));
        Assert.Equal((false, null), (dead.Alive, dead.SilenceEnds));
    }

    [Fact]
    public void A_carrier_back_within_the_timeout_is_ridden_through_and_one_after_it_brings_the_station_back()
    {
        var silent = StationWatch.Start(true).Carrier(false, At(100), Timeout);
        var back = silent.Carrier(true, At(400), Timeout);
        Assert.Equal((true, null), (back.Alive, back.SilenceEnds));

        var revived = silent.SilenceOver(At(700)).Carrier(true, At(5000), Timeout);
        Assert.True(revived.Alive);
    }

    [Fact]
    public void Home_setting_ends_a_silence_without_a_verdict_and_rising_to_silence_starts_one()
    {
        var silent = StationWatch.Start(true).Carrier(false, At(100), Timeout);
        var set = silent.View(false, At(300), Timeout);
        Assert.Equal((true, false, null), (set.Alive, set.InView, set.SilenceEnds));
        // A lost carrier out of view tells nothing: the station may be fine behind the horizon.
        Assert.Null(StationWatch.Start(false).Carrier(false, At(300), Timeout).SilenceEnds);

        var rose = set.View(true, At(2000), Timeout);
        Assert.Equal(At(2600), rose.SilenceEnds);
        Assert.False(rose.SilenceOver(At(2600)).Alive);
    }

    [Fact]
    public void A_second_loss_during_a_silence_keeps_its_first_end()
    {
        var silent = StationWatch.Start(true).Carrier(false, At(100), Timeout);
        Assert.Equal(At(700), silent.View(true, At(300), Timeout).SilenceEnds);
    }
}
