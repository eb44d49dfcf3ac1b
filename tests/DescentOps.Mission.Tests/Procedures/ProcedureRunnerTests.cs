using DescentOps.Mission.Procedures;
using DescentOps.Primitives.Time;

namespace DescentOps.Mission.Tests.Procedures;

/// <summary>Each transition of the pure procedure state machine, alone: no run, no telemetry, no clock.</summary>
public sealed class ProcedureRunnerTests
{
    private static readonly CompiledProcedure Recover = ProcedureFixtures.Compile(ProcedureFixtures.FourSteps);
    private static readonly SimTime T0 = SimTime.FromSecondsSinceEpoch(1000);

    [Fact]
    public void Starting_enters_the_first_step_sends_its_command_and_sets_its_deadline()
    {
        var (run, outputs) = ProcedureRunner.Start(Recover, "a-rule", T0);

        Assert.Equal(0, run.Step);
        Assert.True(run.IsRunning);
        Assert.Equal(T0 + SimDuration.FromSeconds(3 * 3600), run.Deadline);
        Assert.Collection(outputs,
            o => Assert.Equal(new ProcedureStarted(T0, "recover", "a-rule"), o),
            o =>
            {
                var started = Assert.IsType<StepStarted>(o);
                Assert.Equal(("boost", "probe.wall set_power(power=3000)"), (started.Step, started.Send?.ToString()));
                Assert.Equal(run.Deadline, started.Deadline);
            });
    }

    [Fact]
    public void A_wait_that_ends_with_its_check_held_passes_and_enters_the_next_step()
    {
        var (run, _) = ProcedureRunner.Start(Recover, "a-rule", T0);
        var later = T0 + SimDuration.FromSeconds(7800);

        var (next, outputs) = ProcedureRunner.WaitEnded(Recover, run, checkHeld: true, "probe.wall_power=3000@5000s", later);

        Assert.Equal(1, next.Step);
        Assert.Equal(later, next.StepStartedAt);
        Assert.Equal(later + SimDuration.FromSeconds(86400), next.Deadline);
        var ended = Assert.IsType<StepEnded>(outputs[0]);
        Assert.Equal(("boost", StepVerdict.Passed, 7800.0, "confirm", "probe.wall_power=3000@5000s"), (ended.Step, ended.Verdict, ended.Took.TotalSeconds, ended.Next, ended.Evidence));
        Assert.Equal("confirm", Assert.IsType<StepStarted>(outputs[1]).Step);
        Assert.Equal(2, outputs.Count);
    }

    [Fact]
    public void A_wait_that_ends_with_its_check_not_held_fails_and_goes_to_on_fail()
    {
        var run = ProcedureRunner.Start(Recover, "a-rule", T0).Run with { Step = 1 };
        var later = T0 + SimDuration.FromSeconds(600);

        var (next, outputs) = ProcedureRunner.WaitEnded(Recover, run, checkHeld: false, "probe.head_power=0@1600s", later);

        Assert.Equal(StepVerdict.Failed, Assert.IsType<StepEnded>(outputs[0]).Verdict);
        Assert.Equal("fallback", Assert.IsType<StepEnded>(outputs[0]).Next);
        // The fallback waits for nothing: it passes at once and its goto ends the procedure as aborted, in the same instant.
        Assert.Equal(StepVerdict.Passed, Assert.IsType<StepEnded>(outputs[2]).Verdict);
        var finished = Assert.IsType<ProcedureFinished>(outputs[3]);
        Assert.Equal(ProcedureOutcome.Aborted, finished.Outcome);
        Assert.Equal("step 'fallback' passed, goto abort", finished.Reason);
        Assert.Equal(ProcedureOutcome.Aborted, next.Outcome);
        Assert.Null(next.Deadline);
    }

    [Fact]
    public void A_step_that_runs_out_of_time_is_late_and_goes_where_a_failure_goes()
    {
        var (run, _) = ProcedureRunner.Start(Recover, "a-rule", T0);

        var (next, outputs) = ProcedureRunner.TimedOut(Recover, run, "probe.wall_power=1500@9000s", run.Deadline!.Value);

        var ended = Assert.IsType<StepEnded>(outputs[0]);
        Assert.Equal((StepVerdict.Late, 3 * 3600.0, "fallback"), (ended.Verdict, ended.Took.TotalSeconds, ended.Next));
        Assert.Equal("probe enter_safe_mode()", Assert.IsType<StepStarted>(outputs[1]).Send?.ToString());
        Assert.False(next.IsRunning);
    }

    [Fact]
    public void A_step_is_not_late_before_its_deadline()
    {
        var (run, _) = ProcedureRunner.Start(Recover, "a-rule", T0);
        Assert.Throws<InvalidOperationException>(() => ProcedureRunner.TimedOut(Recover, run, "", run.Deadline!.Value - SimDuration.FromSeconds(1e-6)));
    }

    [Fact]
    public void A_step_that_waits_for_nothing_passes_at_once_and_its_goto_done_finishes_the_procedure()
    {
        var run = ProcedureRunner.Start(Recover, "a-rule", T0).Run with { Step = 1 };
        var later = T0 + SimDuration.FromSeconds(1200);

        var (next, outputs) = ProcedureRunner.WaitEnded(Recover, run, checkHeld: true, "", later);

        Assert.Equal(["confirm passed", "report started", "report passed", "finished Done"], outputs.Select(Describe));
        Assert.Equal(ProcedureOutcome.Done, next.Outcome);
    }

    [Fact]
    public void A_finished_procedure_takes_no_further_verdict()
    {
        var done = ProcedureRunner.Start(Recover, "a-rule", T0).Run with { Outcome = ProcedureOutcome.Done };
        Assert.Throws<InvalidOperationException>(() => ProcedureRunner.WaitEnded(Recover, done, true, "", T0));
    }

    [Fact]
    public void Steps_that_go_round_without_waiting_are_aborted_within_the_instant()
    {
        // The checker refuses such a procedure; the runner still ends it rather than loop, should one reach it.
        var step = new CompiledStep("spin", null, null, null, null, 0, CompiledStep.Abort);
        var spinning = new CompiledProcedure("spin", null, [step], "procedures[0]");

        var (run, outputs) = ProcedureRunner.Start(spinning, "test", T0);

        Assert.Equal(ProcedureOutcome.Aborted, run.Outcome);
        Assert.Equal(ProcedureRunner.LoopReason, Assert.IsType<ProcedureFinished>(outputs[^1]).Reason);
    }

    private static string Describe(ProcedureOutput output) => output switch
    {
        StepStarted s => $"{s.Step} started",
        StepEnded e => $"{e.Step} {ProcedureRunner.Word(e.Verdict)}",
        ProcedureFinished f => $"finished {f.Outcome}",
        _ => output.GetType().Name,
    };
}
