using DescentOps.Mission.Procedures;
using DescentOps.Primitives.Time;
using DescentOps.Rules.Evaluation;

namespace DescentOps.Mission.Tests.Procedures;

/// <summary>The desk: one run per procedure, deadlines, and a restore that replays to the same state.</summary>
public sealed class ProcedureDeskTests
{
    private static readonly CompiledProcedure Recover = ProcedureFixtures.Compile(ProcedureFixtures.FourSteps);

    private static TelemetrySample[] WallFrame(double seconds, double wallW) =>
        [new("probe.wall_power", SimTime.FromSecondsSinceEpoch(seconds), new NumericValue(wallW))];

    [Fact]
    public void A_second_start_while_the_procedure_runs_is_ignored()
    {
        var desk = new ProcedureDesk([Recover]);
        desk.Start(0, "first", SimTime.FromSecondsSinceEpoch(100));

        var outputs = desk.Start(0, "second", SimTime.FromSecondsSinceEpoch(200));

        Assert.Equal(new ProcedureStartIgnored(SimTime.FromSecondsSinceEpoch(200), "recover", "second", "boost"), Assert.Single(outputs));
        Assert.Equal(SimTime.FromSecondsSinceEpoch(100), desk.RunOf(0)!.StepStartedAt);
    }

    [Fact]
    public void A_frame_that_meets_the_wait_moves_the_run_on_and_a_wake_at_the_deadline_makes_it_late()
    {
        var desk = new ProcedureDesk([Recover]);
        desk.Start(0, "rule", SimTime.FromSecondsSinceEpoch(100));
        Assert.Equal(SimTime.FromSecondsSinceEpoch(100 + 3 * 3600), desk.NextDeadline);

        Assert.Empty(desk.OnFrame(WallFrame(50, 1000), SimTime.FromSecondsSinceEpoch(700)));
        var passed = desk.OnFrame(WallFrame(650, 3000), SimTime.FromSecondsSinceEpoch(1300));
        Assert.Equal(StepVerdict.Passed, passed.OfType<StepEnded>().Single().Verdict);
        Assert.Equal(1, desk.RunOf(0)!.Step);

        var late = desk.OnWake(SimTime.FromSecondsSinceEpoch(1300 + 86400));
        var ended = late.OfType<StepEnded>().First();
        Assert.Equal(("confirm", StepVerdict.Late, ""), (ended.Step, ended.Verdict, ended.Evidence)); // no frame came after it started
        Assert.False(desk.RunOf(0)!.IsRunning);
    }

    [Fact]
    public void Restoring_an_earlier_version_replays_the_inputs_to_the_same_state()
    {
        var desk = new ProcedureDesk([Recover]);
        desk.Start(0, "rule", SimTime.FromSecondsSinceEpoch(100));
        desk.OnFrame(WallFrame(50, 1000), SimTime.FromSecondsSinceEpoch(700));
        var version = desk.Version;
        var before = desk.RunOf(0);

        desk.OnFrame(WallFrame(650, 3000), SimTime.FromSecondsSinceEpoch(1300));
        Assert.NotEqual(before, desk.RunOf(0));
        desk.RestoreTo(version);

        Assert.Equal(before, desk.RunOf(0));
        // The watch was rebuilt too: the same frame moves the run on again.
        Assert.Equal(StepVerdict.Passed, desk.OnFrame(WallFrame(650, 3000), SimTime.FromSecondsSinceEpoch(1300)).OfType<StepEnded>().Single().Verdict);
    }

    [Fact]
    public void Frames_with_no_step_watching_are_not_kept()
    {
        var desk = new ProcedureDesk([Recover]);
        desk.OnFrame(WallFrame(50, 1000), SimTime.FromSecondsSinceEpoch(700));
        Assert.Equal(0, desk.Version);
    }
}
