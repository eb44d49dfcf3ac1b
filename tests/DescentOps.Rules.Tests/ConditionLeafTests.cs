using DescentOps.Rules.Compiled;

namespace DescentOps.Rules.Tests;

/// <summary>The one walk through a condition's connectives and persistences down to its checks.</summary>
public sealed class ConditionLeafTests
{
    [Fact]
    public void The_checks_come_in_the_order_written_through_every_connective_and_persistence()
    {
        var set = TestCatalogue.Compile("""
            rule r {
              runs on board
              severity high
              when (probe.head_temp above 400 K and not (probe.mode is safe)) or ((probe.depth below 10 m for 5 min) or (step of probe.head_power above 1 kW for 3 samples))
              then { send probe pause_descent }
            }
            """);
        var leaves = ConditionLeaf.Of(Assert.Single(set.Rules).Condition).ToList();

        Assert.Equal(
            [(typeof(LimitCondition), "probe.head_temp", false), (typeof(StateCondition), "probe.mode", false), (typeof(LimitCondition), "probe.depth", false), (typeof(StepCondition), "probe.head_power", true)],
            leaves.Select(l => (l.Check.GetType(), Assert.Single(l.Check.Points), l.CountedInSamples)));
        Assert.DoesNotContain(leaves, l => l.UnderTimeSinceOrLatch);
    }

    [Fact]
    public void Checks_under_a_time_since_or_a_latch_are_marked_as_such()
    {
        var set = TestCatalogue.Compile("""
            rule r {
              runs on board
              severity high
              when time since (station.link is down) above 30 min and latched (probe.depth above 2 km) and probe.head_temp above 400 K
              then { send probe pause_descent }
            }
            """);
        var leaves = ConditionLeaf.Of(Assert.Single(set.Rules).Condition).ToList();
        Assert.Equal([("station.link", true), ("probe.depth", true), ("probe.head_temp", false)], leaves.Select(l => (Assert.Single(l.Check.Points), l.UnderTimeSinceOrLatch)));
    }

    [Fact]
    public void A_bare_check_is_its_own_only_leaf()
    {
        var condition = Assert.Single(TestCatalogue.Compile("rule r { runs on board severity high\nwhen probe.depth above 2 km\nthen { send probe pause_descent } }").Rules).Condition;
        Assert.Equal([new ConditionLeaf(condition, false, false)], ConditionLeaf.Of(condition));
    }
}
