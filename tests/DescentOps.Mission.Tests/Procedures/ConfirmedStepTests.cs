using DescentOps.Mission.Procedures;
using DescentOps.Primitives.Time;

namespace DescentOps.Mission.Tests.Procedures;

/// <summary>Steps that ask a person to confirm them (<c>confirm: true</c>), transition by transition and at the desk.</summary>
public sealed class ConfirmedStepTests
{
    private const string Block = """
        procedures:
          - name: recover
            steps:
              - name: boost
                send: probe.wall set_power(power = 3 kW)
                confirm: true
                wait_for: probe.wall_power above 2.5 kW
                within: 3 h
                on_fail: fallback
              - name: report
                on_pass: done
              - name: fallback
                send: probe enter_safe_mode
                on_pass: abort
        """;

    private static readonly CompiledProcedure Recover = ProcedureFixtures.Compile(Block);
    private static readonly SimTime T0 = SimTime.FromSecondsSinceEpoch(1000);

    [Fact]
    public void With_people_at_a_console_the_step_waits_for_an_answer_before_its_command_goes()
    {
        var (run, outputs) = ProcedureRunner.Start(Recover, "a-rule", T0, peopleAnswer: true);

        Assert.True(run.AwaitingAnswer);
        Assert.Null(run.Deadline);
        var awaits = Assert.IsType<StepAwaitsAnswer>(outputs[^1]);
        Assert.Equal(("boost", "probe.wall set_power(power=3000)"), (awaits.Step, awaits.Send?.ToString()));
        Assert.DoesNotContain(outputs, o => o is StepStarted);
    }

    [Fact]
    public void A_confirmation_sends_the_command_and_starts_the_wait_from_the_moment_of_the_answer()
    {
        var (run, _) = ProcedureRunner.Start(Recover, "a-rule", T0, peopleAnswer: true);
        var answeredAt = T0 + SimDuration.FromSeconds(900);

        var (next, outputs) = ProcedureRunner.Answer(Recover, run, confirmed: true, "Ilse Marrow", 7, answeredAt);

        Assert.Equal(new StepAnswered(answeredAt, "recover", "boost", true, "Ilse Marrow", 7), outputs[0]);
        var started = Assert.IsType<StepStarted>(outputs[1]);
        Assert.Equal("probe.wall set_power(power=3000)", started.Send?.ToString());
        // 'within: 3 h' counts from the confirmation.
        Assert.Equal(answeredAt + SimDuration.FromSeconds(3 * 3600), next.Deadline);
        Assert.False(next.AwaitingAnswer);
    }

    [Fact]
    public void A_skip_sends_nothing_and_goes_where_a_pass_goes()
    {
        var (run, _) = ProcedureRunner.Start(Recover, "a-rule", T0, peopleAnswer: true);
        var (next, outputs) = ProcedureRunner.Answer(Recover, run, confirmed: false, "Ilse Marrow", 8, T0);

        Assert.Equal(new StepAnswered(T0, "recover", "boost", false, "Ilse Marrow", 8), outputs[0]);
        Assert.Equal(StepVerdict.Skipped, Assert.IsType<StepEnded>(outputs[1]).Verdict);
        Assert.DoesNotContain(outputs, o => o is StepStarted { Step: "boost" });
        // 'report' waits for nothing and goes to done.
        Assert.Equal(ProcedureOutcome.Done, next.Outcome);
    }

    [Fact]
    public void Without_a_console_the_team_confirms_at_once()
    {
        var (run, outputs) = ProcedureRunner.Start(Recover, "a-rule", T0);
        Assert.Equal(new StepAnswered(T0, "recover", "boost", true, ProcedureRunner.Team, 0), outputs[1]);
        Assert.IsType<StepStarted>(outputs[2]);
        Assert.Equal(T0 + SimDuration.FromSeconds(3 * 3600), run.Deadline);
    }

    [Fact]
    public void The_desk_ignores_an_answer_for_a_step_that_is_not_waiting_and_takes_one_that_is()
    {
        var desk = new ProcedureDesk([Recover]);
        var early = Assert.IsType<ProcedureAnswerIgnored>(Assert.Single(desk.Answer("recover", "boost", true, "Ilse Marrow", 1, T0)));
        Assert.Equal("the procedure is not running", early.Reason);

        desk.Start(0, "a-rule", T0, peopleAnswer: true);
        var wrong = Assert.IsType<ProcedureAnswerIgnored>(Assert.Single(desk.Answer("recover", "report", true, "Ilse Marrow", 2, T0)));
        Assert.Equal("the procedure is at step 'boost'", wrong.Reason);

        var taken = desk.Answer("recover", "boost", true, "Ilse Marrow", 3, T0);
        Assert.Contains(taken, o => o is StepStarted { Step: "boost" });
        Assert.Equal(T0 + SimDuration.FromSeconds(3 * 3600), desk.NextDeadline);

        // The desk's state replays: back to before the answer, the step waits again.
        desk.RestoreTo(desk.Version - 1);
        Assert.True(desk.RunOf(0)!.AwaitingAnswer);
    }
}
