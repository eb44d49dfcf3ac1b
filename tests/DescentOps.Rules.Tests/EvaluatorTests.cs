using DescentOps.Rules.Evaluation;

namespace DescentOps.Rules.Tests;

public sealed class EvaluatorTests
{
    private static string Rule(string name, string when, string then = "send probe pause_descent", string extra = "") =>
        $"rule {name} {{ runs on board severity high {extra}\n when {when}\n then {{ {then} }} }}\n";

    [Theory]
    // Above and below are strict; a band includes its ends (420 K is inside 400–420 K).
    [InlineData("above 420 K", 420.0, false)]
    [InlineData("above 420 K", 420.5, true)]
    [InlineData("below 300 K", 299.0, true)]
    [InlineData("inside 400 K to 420 K", 420.0, true)]
    [InlineData("outside 400 K to 420 K", 420.0, false)]
    [InlineData("outside 400 K to 420 K", 399.0, true)]
    // 150 °C is 150 + 273.15 = 423.15 K.
    [InlineData("above 150 °C", 423.0, false)]
    [InlineData("above 150 °C", 423.2, true)]
    public void Limit_checks_compare_the_latest_sample(string threshold, double kelvin, bool fires)
    {
        var run = new EvaluatorHarness(Rule("hot", $"probe.head_temp {threshold}")).Number("probe.head_temp", 10, kelvin);
        Assert.Equal(fires ? 1 : 0, run.Firings.Count);
    }

    [Fact]
    public void A_firing_carries_its_evidence_and_its_commands_in_SI()
    {
        var run = new EvaluatorHarness(Rule("hot", "probe.head_temp above 420 K", "send probe.head set_power(power = 1.5 kW)"))
            .Number("probe.head_temp", 60, 430.0);
        var firing = Assert.Single(run.Firings);
        var evidence = Assert.Single(firing.Evidence);
        Assert.Equal(("probe.head_temp", EvaluatorHarness.At(60), 430.0), (evidence.Point, evidence.Time, ((NumericValue)evidence.Value).ValueSi));
        var command = Assert.Single(firing.Commands);
        Assert.Equal(("probe.head", "set_power"), (command.Target.Name, command.Command));
        // 1.5 kW × 1000 = 1500 W.
        Assert.Equal(1500.0, Assert.Single(command.Arguments).ValueSi);
    }

    [Fact]
    public void A_rule_fires_once_per_episode_and_again_after_it_clears()
    {
        var run = new EvaluatorHarness(Rule("hot", "probe.head_temp above 420 K"))
            .Number("probe.head_temp", 10, 430).Number("probe.head_temp", 20, 431)
            .Number("probe.head_temp", 30, 400)
            .Number("probe.head_temp", 40, 440);
        Assert.Equal([10.0, 40.0], run.Firings.Select(f => f.Time.SecondsSinceEpoch));
        // Clearing also frees the actuator the firing commanded.
        Assert.Equal([RuleEventKind.Cleared, RuleEventKind.ActuatorReleased], run.Events.Select(e => e.Kind));
    }

    [Fact]
    public void An_expected_state_check_matches_the_discrete_value()
    {
        var run = new EvaluatorHarness(Rule("lost-link", "station.link is down"))
            .State("station.link", 5, "up").State("station.link", 6, "down");
        Assert.Equal(6.0, Assert.Single(run.Firings).Time.SecondsSinceEpoch);
    }

    [Fact]
    public void A_rate_check_uses_the_sample_a_full_window_back()
    {
        // Depth 100 m at t = 0 and 100.2 m at t = 3600 s: 0.2 m/h, below the 0.5 m/h threshold. The sample at
        // 1800 s is inside the window, so it is not the reference.
        var run = new EvaluatorHarness(Rule("stalled", "rate of probe.depth over 1 h below 0.5 m/h"))
            .Number("probe.depth", 0, 100.0)
            .Number("probe.depth", 1800, 100.15);
        Assert.Empty(run.Firings);
        run.Number("probe.depth", 3600, 100.2);
        var firing = Assert.Single(run.Firings);
        Assert.Equal([0.0, 3600.0], firing.Evidence.Select(e => e.Time.SecondsSinceEpoch));
    }

    [Fact]
    public void A_fast_descent_does_not_trip_the_stall_rule()
    {
        // 100 m → 101 m in one hour is 1 m/h, above 0.5 m/h.
        var run = new EvaluatorHarness(Rule("stalled", "rate of probe.depth over 1 h below 0.5 m/h"))
            .Number("probe.depth", 0, 100.0).Number("probe.depth", 3600, 101.0);
        Assert.Empty(run.Firings);
    }

    [Fact]
    public void A_step_check_compares_consecutive_samples()
    {
        // 400 K → 406 K is a step of 6 K, more than 5 K; 406 K → 409 K is 3 K.
        var run = new EvaluatorHarness(Rule("jump", "step of probe.head_temp above 5 K"))
            .Number("probe.head_temp", 0, 400).Number("probe.head_temp", 10, 406);
        Assert.Single(run.Firings);
        run.Number("probe.head_temp", 20, 409);
        Assert.Equal(RuleEventKind.Cleared, run.Events[0].Kind);
        Assert.Single(run.Firings);
    }

    [Fact]
    public void Boolean_combinations_need_every_and_and_any_or()
    {
        var run = new EvaluatorHarness(Rule("combo", "probe.head_temp above 420 K and (station.link is down or not probe.mode is descending)"))
            .Number("probe.head_temp", 0, 430).State("probe.mode", 1, "descending").State("station.link", 2, "up");
        Assert.Empty(run.Firings);
        run.State("probe.mode", 3, "paused");
        var firing = Assert.Single(run.Firings);
        // Evidence: the temperature and the mode that made 'not ... descending' true; the link did not count.
        Assert.Equal(["probe.head_temp", "probe.mode"], firing.Evidence.Select(e => e.Point));
    }

    [Fact]
    public void Not_does_not_fire_on_silence()
    {
        var run = new EvaluatorHarness(Rule("quiet", "not probe.mode is descending") + Rule("other", "probe.head_temp above 1 K", "send wisp-1 recall"))
            .Number("probe.head_temp", 0, 2);
        Assert.Equal(["other"], run.Firings.Select(f => f.Rule));
    }

    [Fact]
    public void Persistence_by_duration_fires_when_the_period_ends_between_samples()
    {
        // True from t = 100 s; 10 min = 600 s later is t = 700 s, with no sample then.
        var run = new EvaluatorHarness(Rule("hot", "probe.head_temp above 420 K for 10 min"))
            .Number("probe.head_temp", 100, 430).Number("probe.head_temp", 400, 431);
        Assert.Empty(run.Firings);
        run.Until(699);
        Assert.Empty(run.Firings);
        run.Until(1000);
        var firing = Assert.Single(run.Firings);
        Assert.Equal(700.0, firing.Time.SecondsSinceEpoch);
        Assert.Equal([100.0, 400.0], firing.Evidence.Select(e => e.Time.SecondsSinceEpoch));
    }

    [Fact]
    public void Persistence_by_duration_restarts_after_a_break()
    {
        // Broken at t = 300 s; true again from 400 s, so due at 400 + 600 = 1000 s, not at 700 s.
        var run = new EvaluatorHarness(Rule("hot", "probe.head_temp above 420 K for 10 min"))
            .Number("probe.head_temp", 100, 430).Number("probe.head_temp", 300, 410).Number("probe.head_temp", 400, 430)
            .Until(2000);
        Assert.Equal(1000.0, Assert.Single(run.Firings).Time.SecondsSinceEpoch);
    }

    [Fact]
    public void Persistence_by_count_needs_consecutive_samples_of_its_own_point()
    {
        // Three consecutive samples above 420 K; a sample of another point in between does not count or break.
        var run = new EvaluatorHarness(Rule("hot", "(probe.head_temp above 420 K for 3 samples) and station.link is up"))
            .State("station.link", 0, "up")
            .Number("probe.head_temp", 1, 430).Number("probe.head_temp", 2, 430)
            .State("station.link", 3, "up");
        Assert.Empty(run.Firings);
        run.Number("probe.head_temp", 4, 410).Number("probe.head_temp", 5, 430).Number("probe.head_temp", 6, 430);
        Assert.Empty(run.Firings);
        run.Number("probe.head_temp", 7, 430);
        var firing = Assert.Single(run.Firings);
        Assert.Equal(7.0, firing.Time.SecondsSinceEpoch);
        // Evidence: the link as last seen (t = 3 s) and the three counted temperatures.
        Assert.Equal([3.0, 5.0, 6.0, 7.0], firing.Evidence.Select(e => e.Time.SecondsSinceEpoch));
    }

    [Fact]
    public void For_applies_to_the_whole_combination_and_counts_each_frame_once()
    {
        // The trap of issue 15: with 'for' bound to the last comparison, this fired on the first sample of the
        // temperature; counting each point's sample, a two-point combination 'for 12 samples' fired after 6 frames.
        // Frames every 10 s carry both points at one instant; the power holds throughout, the temperature from frame 1.
        var run = new EvaluatorHarness(Rule("hot", "probe.head_temp above 420 K and probe.head_power above 1 kW for 12 samples"));
        for (var frame = 0; frame < 12; frame++)
        {
            run.Frame(10 * frame, ("probe.head_temp", frame == 0 ? 410 : 430), ("probe.head_power", 2000));
        }

        Assert.Empty(run.Firings);
        run.Frame(120, ("probe.head_temp", 430), ("probe.head_power", 2000));
        // Frames 1 to 12 are the twelve on which both held: 12 frames, not 6, and not frame 1's single temperature.
        var firing = Assert.Single(run.Firings);
        Assert.Equal(120.0, firing.Time.SecondsSinceEpoch);
    }

    [Fact]
    public void A_frame_is_taken_whole_before_any_rule_decides()
    {
        // At t = 20 s the frame's temperature comes first (with the last frame's power the combination would hold),
        // then its power breaks it: the frame is taken whole, so nothing fires on the stale power, the instant does
        // not count, and the run of three starts again at 30 s and completes at 50 s.
        var run = new EvaluatorHarness(Rule("hot", "probe.head_temp above 420 K and probe.head_power above 1 kW for 3 samples"));
        foreach (var (t, power) in new[] { (0, 2000.0), (10, 2000.0), (20, 500.0), (30, 2000.0), (40, 2000.0) })
        {
            run.Frame(t, ("probe.head_temp", 430), ("probe.head_power", power));
        }

        Assert.Empty(run.Firings);
        run.Frame(50, ("probe.head_temp", 430), ("probe.head_power", 2000));
        Assert.Equal(50.0, Assert.Single(run.Firings).Time.SecondsSinceEpoch);
    }

    [Fact]
    public void A_wait_sends_the_rest_of_the_sequence_later()
    {
        var run = new EvaluatorHarness(Rule("hot", "probe.head_temp above 420 K", "send probe.head set_power(power = 1 kW) wait 10 min send probe pause_descent"))
            .Number("probe.head_temp", 0, 430).Until(599);
        Assert.Empty(run.Outputs.OfType<RuleContinuation>());
        run.Until(600);
        var continuation = Assert.Single(run.Outputs.OfType<RuleContinuation>());
        Assert.Equal((600.0, "pause_descent"), (continuation.Time.SecondsSinceEpoch, Assert.Single(continuation.Commands).Command));
    }

    private const string Escalating = "send probe.head set_power(power = 1 kW)";

    [Fact]
    public void Escalation_runs_when_the_condition_has_not_cleared()
    {
        var text = Rule("hot", "probe.head_temp above 420 K", Escalating) .Replace("}\n", "")
            + " escalate after 1 h { send probe enter_safe_mode } }\n";
        var run = new EvaluatorHarness(text).Number("probe.head_temp", 0, 430).Number("probe.head_temp", 1800, 425).Until(7200);
        var escalation = Assert.Single(run.Outputs.OfType<RuleEscalation>());
        // Fired at t = 0; one hour later is t = 3600 s.
        Assert.Equal((3600.0, 1, "enter_safe_mode"), (escalation.Time.SecondsSinceEpoch, escalation.Level, Assert.Single(escalation.Commands).Command));
        Assert.Equal(1800.0, Assert.Single(escalation.Evidence).Time.SecondsSinceEpoch);
    }

    [Fact]
    public void Escalation_is_withdrawn_when_the_condition_clears_first()
    {
        var text = Rule("hot", "probe.head_temp above 420 K", Escalating).Replace("}\n", "")
            + " escalate after 1 h { send probe enter_safe_mode } }\n";
        var run = new EvaluatorHarness(text).Number("probe.head_temp", 0, 430).Number("probe.head_temp", 1800, 410).Until(7200);
        Assert.Empty(run.Outputs.OfType<RuleEscalation>());
        Assert.Contains(run.Events, e => e.Kind == RuleEventKind.EscalationWithdrawn && e.Time == EvaluatorHarness.At(1800));
    }

    [Fact]
    public void Cooldown_holds_a_second_firing_back_until_it_ends()
    {
        // Fired at t = 0 with a 30 min (1800 s) cooldown; cleared at 60 s, true again at 120 s: fires at 1800 s.
        var run = new EvaluatorHarness(Rule("hot", "probe.head_temp above 420 K", extra: "cooldown 30 min"))
            .Number("probe.head_temp", 0, 430).Number("probe.head_temp", 60, 410).Number("probe.head_temp", 120, 430)
            .Until(1799);
        Assert.Single(run.Firings);
        Assert.Contains(run.Events, e => e.Kind == RuleEventKind.HeldByCooldown && e.Time == EvaluatorHarness.At(120));
        run.Until(3600);
        Assert.Equal([0.0, 1800.0], run.Firings.Select(f => f.Time.SecondsSinceEpoch));
    }

    [Fact]
    public void A_rule_can_enable_and_disable_others()
    {
        var text = Rule("arm", "probe.mode is paused", "enable watch-depth disable watch-link", "priority 2")
            + Rule("watch-depth", "probe.depth above 10 m", "send wisp-1 recall", "starts disabled")
            + Rule("watch-link", "station.link is down", "send station drop_relay(relay = 2)", "priority 1");
        var run = new EvaluatorHarness(text).Number("probe.depth", 0, 20);
        Assert.Empty(run.Firings);
        run.State("probe.mode", 1, "paused");
        Assert.True(run.Evaluator.IsEnabled("watch-depth"));
        Assert.False(run.Evaluator.IsEnabled("watch-link"));
        run.Number("probe.depth", 2, 21).State("station.link", 3, "down");
        Assert.Equal(["arm", "watch-depth"], run.Firings.Select(f => f.Rule));
        Assert.Equal([RuleEventKind.Enabled, RuleEventKind.Disabled], run.Events.Select(e => e.Kind));
    }

    [Fact]
    public void Disabling_a_rule_drops_its_pending_steps()
    {
        var text = Rule("slow", "probe.head_temp above 420 K", "wait 1 h send probe pause_descent", "priority 1")
            + Rule("stop", "probe.mode is safe", "disable slow");
        var run = new EvaluatorHarness(text).Number("probe.head_temp", 0, 430).State("probe.mode", 60, "safe").Until(7200);
        Assert.Empty(run.Outputs.OfType<RuleContinuation>());
    }

    [Fact]
    public void The_higher_priority_rule_takes_an_actuator_and_blocks_the_lower()
    {
        var text = Rule("push", "probe.mode is descending", "send probe.head set_power(power = 6 kW) wait 10 min send probe.head set_power(power = 7 kW)", "priority 1")
            + Rule("cool", "probe.head_temp above 600 K", "send probe.head set_power(power = 1 kW)", "priority 5");
        var run = new EvaluatorHarness(text).State("probe.mode", 0, "descending").Number("probe.head_temp", 60, 650).Until(600);
        Assert.Equal(["push", "cool"], run.Firings.Select(f => f.Rule));
        Assert.Single(run.Firings[1].Commands);
        Assert.Contains(run.Events, e => e.Kind == RuleEventKind.ActuatorTaken && e.Rule == "cool");
        // At 600 s the push rule's second command finds the head held by the priority-5 rule.
        Assert.Empty(Assert.Single(run.Outputs.OfType<RuleContinuation>()).Commands);
        Assert.Contains(run.Events, e => e.Kind == RuleEventKind.CommandBlocked && e.Rule == "push");
    }

    [Fact]
    public void Equal_priorities_under_an_exclusion_leave_the_actuator_with_the_first()
    {
        var text = Rule("warm", "probe.head_temp below 300 K", "send probe.heater-3 switch(state = on)")
            + Rule("trim", "probe.mode is paused", "send probe.heater-3 switch(state = off)")
            + "exclusive probe.heater-3 (warm, trim)\n";
        var run = new EvaluatorHarness(text).Number("probe.head_temp", 0, 250).State("probe.mode", 1, "paused");
        Assert.Equal([1, 0], run.Firings.Select(f => f.Commands.Count));
        // Once 'warm' clears, the heater is free and 'trim' gets it on its next firing.
        run.Number("probe.head_temp", 2, 310).State("probe.mode", 3, "descending").State("probe.mode", 4, "paused");
        Assert.Single(run.Firings[^1].Commands);
    }

    [Fact]
    public void Rules_of_higher_priority_are_evaluated_first_on_a_shared_sample()
    {
        var text = Rule("low", "probe.head_temp above 420 K", "send wisp-1 recall", "priority 1")
            + Rule("high", "probe.head_temp above 420 K", "send probe enter_safe_mode", "priority 9");
        var run = new EvaluatorHarness(text).Number("probe.head_temp", 0, 430);
        Assert.Equal(["high", "low"], run.Firings.Select(f => f.Rule));
    }

    [Fact]
    public void Late_mistyped_and_non_finite_samples_are_rejected()
    {
        var run = new EvaluatorHarness(Rule("hot", "probe.head_temp above 420 K"))
            .Number("probe.head_temp", 100, 400)
            .Number("probe.head_temp", 50, 430)
            .State("probe.head_temp", 101, "hot")
            .Number("probe.head_temp", 102, double.NaN);
        Assert.Empty(run.Firings);
        Assert.Equal(3, run.Events.Count(e => e.Kind == RuleEventKind.SampleRejected));
    }

    [Fact]
    public void The_same_inputs_give_the_same_outputs()
    {
        var text = Rule("hot", "probe.head_temp above 420 K for 5 min", "send probe.head set_power(power = 1 kW) wait 1 min send probe pause_descent", "cooldown 20 min priority 3")
            .Replace("}\n", "") + " escalate after 30 min { send probe enter_safe_mode } }\n"
            + Rule("stall", "rate of probe.depth over 10 min below 0.5 m/h for 2 samples", "send probe.head set_power(power = 7 kW)", "priority 1");

        string Run()
        {
            var run = new EvaluatorHarness(text);
            for (var i = 0; i < 400; i++)
            {
                // A temperature that swings ±40 K about 420 K every 40 samples of 60 s, and a depth rising at
                // 0.3 m/h in the first half and 0.9 m/h in the second.
                var t = i * 60.0;
                run.Number("probe.head_temp", t, 420.0 + 40.0 * Math.Sin(i * 2.0 * Math.PI / 40.0));
                run.Number("probe.depth", t, 100.0 + (i < 200 ? 0.3 : 0.9) * t / 3600.0);
            }

            run.Until(400 * 60.0);
            Assert.NotEmpty(run.Firings);
            return string.Join("\n", run.Outputs.Select(o => o.ToString()));
        }

        Assert.Equal(Run(), Run());
    }
}
