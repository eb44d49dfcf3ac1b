using DescentOps.Mission.Procedures;
using DescentOps.Primitives.Time;
using DescentOps.Rules.Evaluation;

namespace DescentOps.Mission.Tests.Procedures;

/// <summary>A step's watch judges its wait and its check with the rule language's own counting and evidence.</summary>
public sealed class ProcedureWatchTests
{
    private static readonly CompiledProcedure Recover = ProcedureFixtures.Compile(ProcedureFixtures.FourSteps);

    private static TelemetrySample[] Frame(double seconds, string regime, double headPowerW) =>
    [
        new("probe.head_power", SimTime.FromSecondsSinceEpoch(seconds), new NumericValue(headPowerW)),
        new("probe.regime", SimTime.FromSecondsSinceEpoch(seconds), new DiscreteValue(regime)),
    ];

    [Fact]
    public void A_wait_for_two_samples_ends_on_the_second_frame_that_holds()
    {
        using var watch = new ProcedureWatch(Recover.Steps[1]); // probe.regime is Melting for 2 samples

        Assert.False(watch.OnFrame(Frame(600, "FrozenIn", 0)).Ended);
        Assert.False(watch.OnFrame(Frame(1200, "Melting", 2000)).Ended);
        var (ended, held, evidence) = watch.OnFrame(Frame(1800, "Melting", 2000));

        Assert.True(ended);
        Assert.True(held);
        Assert.Contains("probe.regime=Melting@1800s", evidence, StringComparison.Ordinal);
        Assert.Contains("probe.head_power=2000@1800s", evidence, StringComparison.Ordinal);
    }

    [Fact]
    public void A_check_without_a_wait_is_judged_on_the_first_frame_carrying_its_points_not_on_the_stations_status_alone()
    {
        var step = ProcedureFixtures.Compile("""
            procedures:
              - name: look
                steps:
                  - name: check-head
                    expect: probe.head_power above 1 kW
                    within: 1 h
            """).Steps[0];
        using var watch = new ProcedureWatch(step);
        var status = new TelemetrySample("station.alive", SimTime.FromSecondsSinceEpoch(600), new DiscreteValue("no"));

        Assert.False(watch.OnFrame([status]).Ended);
        var (ended, held, _) = watch.OnFrame(Frame(1200, "Melting", 2000));
        Assert.True(ended && held);
    }

    [Fact]
    public void A_check_that_does_not_hold_on_the_frame_that_ends_the_wait_fails_with_the_readings_seen()
    {
        using var watch = new ProcedureWatch(Recover.Steps[1]); // expect probe.head_power above 1 kW

        watch.OnFrame(Frame(600, "Melting", 500));
        var (ended, held, evidence) = watch.OnFrame(Frame(1200, "Melting", 500));

        Assert.True(ended);
        Assert.False(held);
        Assert.Contains("probe.head_power=500@1200s", evidence, StringComparison.Ordinal);
    }

    [Fact]
    public void A_late_step_reports_the_last_readings_of_what_it_waited_for()
    {
        using var watch = new ProcedureWatch(Recover.Steps[0]); // probe.wall_power above 2.5 kW
        watch.OnFrame([new("probe.wall_power", SimTime.FromSecondsSinceEpoch(600), new NumericValue(1500))]);
        Assert.Equal("probe.wall_power=1500@600s", watch.LastSeen());
    }
}
