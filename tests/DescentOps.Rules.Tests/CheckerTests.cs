using DescentOps.Rules.Compiled;
using DescentOps.Rules.Text;

namespace DescentOps.Rules.Tests;

public sealed class CheckerTests
{
    /// <summary>
    /// A rule whose condition is line 2 and whose actions are line 3. Columns in the tests count from there:
    /// "when " is 5 characters, so a condition starts at column 6; "then { " is 7, so "send " ends at column 12.
    /// </summary>
    private static string Rule(string when, string then = "send probe pause_descent", string header = "runs on board severity high") =>
        $"rule r {{ {header}\nwhen {when}\nthen {{ {then} }} }}";

    private static RuleDiagnostic SingleError(string text)
    {
        var result = TestCatalogue.Check(text);
        Assert.Null(result.RuleSet);
        return Assert.Single(result.Errors);
    }

    private static void AssertAt(RuleDiagnostic diagnostic, DiagnosticCode code, int line, int column)
    {
        Assert.Equal((code, line, column), (diagnostic.Code, diagnostic.Location.Line, diagnostic.Location.Column));
        Assert.Equal("test.dorules", diagnostic.Location.Source);
    }

    [Fact]
    public void A_valid_rule_compiles_to_SI()
    {
        var set = TestCatalogue.Compile(Rule("probe.head_temp above 147 °C", "send probe.head set_power(power = 2.5 kW)"));
        var rule = Assert.Single(set.Rules);
        var limit = Assert.IsType<LimitCondition>(rule.Condition);
        // 147 °C + 273.15 = 420.15 K.
        Assert.Equal(420.15, limit.Threshold.LowerSi, 9);
        var send = Assert.IsType<SendAction>(Assert.Single(rule.Actions));
        // 2.5 kW × 1000 = 2500 W.
        Assert.Equal(2500.0, Assert.Single(send.Command.Arguments).ValueSi);
    }

    [Fact]
    public void Syntax_errors_come_through_the_checker()
    {
        var error = SingleError("rule r { runs on sea }");
        AssertAt(error, DiagnosticCode.UnexpectedToken, 1, 18);
    }

    [Fact]
    public void An_unknown_point_is_located()
    {
        AssertAt(SingleError(Rule("probe.tail_temp above 300 K")), DiagnosticCode.UnknownPoint, 2, 6);
    }

    [Fact]
    public void A_threshold_on_a_discrete_point_is_the_wrong_kind()
    {
        AssertAt(SingleError(Rule("probe.mode above 3 K")), DiagnosticCode.WrongPointKind, 2, 6);
    }

    [Fact]
    public void A_power_compared_with_a_depth_is_a_unit_mismatch()
    {
        var error = SingleError(Rule("probe.depth above 5 kW"));
        // "when probe.depth above " is 5 + 11 + 1 + 5 + 1 = 23 characters: the threshold starts at column 24.
        AssertAt(error, DiagnosticCode.UnitMismatch, 2, 24);
        Assert.Contains("length", error.Message);
        Assert.Contains("power", error.Message);
    }

    [Fact]
    public void A_rate_threshold_must_be_a_rate()
    {
        // A depth's rate is a speed; a bare length is not one. "when rate of probe.depth over 1 h below " is 40 characters.
        AssertAt(SingleError(Rule("rate of probe.depth over 1 h below 2 m")), DiagnosticCode.UnitMismatch, 2, 41);
    }

    [Fact]
    public void A_rate_of_a_depth_in_metres_per_hour_is_accepted()
    {
        var set = TestCatalogue.Compile(Rule("rate of probe.depth over 1 h below 0.36 m/h"));
        var rate = Assert.IsType<RateCondition>(Assert.Single(set.Rules).Condition);
        // 0.36 m/h ÷ 3600 s/h = 1e-4 m/s.
        Assert.Equal(1e-4, rate.ThresholdPerSecond.UpperSi, 12);
    }

    [Fact]
    public void A_threshold_without_a_unit_is_missing_its_unit()
    {
        // "when probe.head_temp above " is 5 + 15 + 1 + 5 + 1 = 27 characters; the same prefix serves the next tests.
        AssertAt(SingleError(Rule("probe.head_temp above 420")), DiagnosticCode.MissingUnit, 2, 28);
    }

    [Fact]
    public void An_unknown_unit_is_located_at_the_unit()
    {
        // The unit follows "420 " at columns 28–31.
        AssertAt(SingleError(Rule("probe.head_temp above 420 kelvins")), DiagnosticCode.UnknownUnit, 2, 32);
    }

    [Fact]
    public void A_threshold_beyond_the_sensor_range_is_refused()
    {
        // The catalogue's head temperature range ends at 1000 K; 1200 K is beyond it.
        AssertAt(SingleError(Rule("probe.head_temp above 1200 K")), DiagnosticCode.ThresholdOutsideRange, 2, 28);
    }

    [Fact]
    public void A_band_written_backwards_is_invalid()
    {
        // "when probe.head_temp inside " is 28 characters; the error points at the lower end.
        AssertAt(SingleError(Rule("probe.head_temp inside 400 K to 300 K")), DiagnosticCode.InvalidBand, 2, 29);
    }

    [Fact]
    public void A_state_the_point_never_takes_is_impossible()
    {
        var error = SingleError(Rule("probe.mode is sleeping"));
        AssertAt(error, DiagnosticCode.ImpossibleDiscreteValue, 2, 20);
        Assert.Contains("descending, paused, safe", error.Message);
    }

    [Fact]
    public void A_zero_persistence_is_not_a_duration()
    {
        // "when probe.head_temp above 400 K for " is 27 + 6 + 4 = 37 characters.
        AssertAt(SingleError(Rule("probe.head_temp above 400 K for 0 s")), DiagnosticCode.NonPositiveDuration, 2, 38);
    }

    [Fact]
    public void An_unknown_command_and_an_unknown_target_are_located()
    {
        // "then { send probe " is 18 characters; "then { send " is 12.
        AssertAt(SingleError(Rule("probe.mode is safe", "send probe reverse")), DiagnosticCode.UnknownCommand, 3, 19);
        AssertAt(SingleError(Rule("probe.mode is safe", "send tail pause_descent")), DiagnosticCode.UnknownCommand, 3, 13);
    }

    [Fact]
    public void Argument_problems_are_each_located()
    {
        // "then { send probe.head set_power(" is 33 characters, so the first argument is at column 34 and its
        // value ("power = ") at column 42; the command name is at column 24.
        AssertAt(SingleError(Rule("probe.mode is safe", "send probe.head set_power(watts = 2 kW, power = 2 kW)")), DiagnosticCode.UnknownArgument, 3, 34);
        AssertAt(SingleError(Rule("probe.mode is safe", "send probe.head set_power")), DiagnosticCode.MissingArgument, 3, 24);
        // The head accepts 0–8 kW; 9 kW is beyond it.
        AssertAt(SingleError(Rule("probe.mode is safe", "send probe.head set_power(power = 9 kW)")), DiagnosticCode.ArgumentOutOfRange, 3, 42);
        AssertAt(SingleError(Rule("probe.mode is safe", "send probe.head set_power(power = 2 m)")), DiagnosticCode.UnitMismatch, 3, 42);
        // "then { send probe.heater-3 switch(state = " is 42 characters.
        AssertAt(SingleError(Rule("probe.mode is safe", "send probe.heater-3 switch(state = dim)")), DiagnosticCode.ArgumentOutOfRange, 3, 43);
    }

    [Fact]
    public void A_range_in_a_message_carries_its_SI_unit()
    {
        // The test catalogue's head takes 0 to 8000 W and its temperature point reads 0 to 1000 K.
        Assert.Contains("(0 W to 8000 W)", SingleError(Rule("probe.mode is safe", "send probe.head set_power(power = 9 kW)")).Message, StringComparison.Ordinal);
        Assert.Contains("(0 K to 1000 K)", SingleError(Rule("probe.head_temp above 1200 K")).Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Enabling_an_unknown_rule_is_an_error()
    {
        // "then { enable " is 14 characters.
        AssertAt(SingleError(Rule("probe.mode is safe", "enable ghost")), DiagnosticCode.UnknownRule, 3, 15);
    }

    [Fact]
    public void A_second_rule_with_the_same_name_is_a_duplicate()
    {
        var text = Rule("probe.mode is safe") + "\n" + Rule("probe.mode is paused");
        // The second copy starts on line 4; "rule " puts its name at column 6.
        AssertAt(SingleError(text), DiagnosticCode.DuplicateRule, 4, 6);
    }

    [Fact]
    public void Board_rules_need_event_based_autonomy()
    {
        AssertAt(SingleError("autonomy E2\n" + Rule("probe.mode is safe")), DiagnosticCode.PlacementNotAllowed, 2, 1);
        Assert.True(TestCatalogue.Check("autonomy E2\n" + Rule("probe.mode is safe", header: "runs on ground severity high")).Succeeded);
    }

    private const string TwoHeadRules = """
        rule cool-head { runs on board severity high priority 5
          when probe.head_temp above 600 K
          then { send probe.head set_power(power = 1 kW) } }
        rule push-head { runs on board severity low priority 5
          when rate of probe.depth over 1 h below 0.5 m/h
          then { send probe.head set_power(power = 6 kW) } }
        """;

    [Fact]
    public void Two_rules_on_one_actuator_at_one_priority_conflict()
    {
        var error = SingleError(TwoHeadRules);
        // Reported at the second rule's command target: line 6, after "  then { send ".
        AssertAt(error, DiagnosticCode.ActuatorConflict, 6, 15);
        Assert.Contains("cool-head", error.Message);
    }

    [Fact]
    public void An_exclusion_or_different_priorities_resolve_the_conflict()
    {
        Assert.True(TestCatalogue.Check(TwoHeadRules + "\nexclusive probe.head (cool-head, push-head)").Succeeded);
        Assert.True(TestCatalogue.Check(TwoHeadRules.Replace("severity low priority 5", "severity low priority 4")).Succeeded);
    }

    [Fact]
    public void Contradictory_bounds_warn_that_the_rule_never_fires()
    {
        var result = TestCatalogue.Check(Rule("probe.head_temp above 500 K and probe.head_temp below 400 K"));
        Assert.True(result.Succeeded);
        var warning = Assert.Single(result.Warnings);
        AssertAt(warning, DiagnosticCode.ContradictoryBounds, 2, 6);
        Assert.Equal(DiagnosticSeverity.Warning, warning.Severity);
    }

    [Fact]
    public void Bounds_at_the_edge_of_the_physical_range_can_contradict_it()
    {
        // The range ends at 1000 K inclusive; "above 1000 K" is strictly beyond it.
        var warning = Assert.Single(TestCatalogue.Check(Rule("probe.head_temp above 1000 K for 2 samples")).Warnings);
        Assert.Equal(DiagnosticCode.ContradictoryBounds, warning.Code);
    }

    [Fact]
    public void Two_required_states_of_one_point_contradict()
    {
        var warning = Assert.Single(TestCatalogue.Check(Rule("probe.mode is safe and probe.mode is paused")).Warnings);
        Assert.Equal(DiagnosticCode.ContradictoryBounds, warning.Code);
    }

    [Fact]
    public void An_either_or_with_one_live_branch_can_fire()
    {
        Assert.Empty(TestCatalogue.Check(Rule("(probe.mode is safe and probe.mode is paused) or probe.mode is descending")).Warnings);
    }

    [Fact]
    public void A_rule_that_starts_disabled_and_is_never_enabled_warns()
    {
        var text = Rule("probe.mode is safe", header: "runs on board severity high starts disabled");
        var warning = Assert.Single(TestCatalogue.Check(text).Warnings);
        AssertAt(warning, DiagnosticCode.NeverEnabled, 1, 1);
    }

    [Fact]
    public void Enabling_through_a_rule_that_cannot_fire_does_not_count()
    {
        var text = """
            rule dead { runs on ground severity info
              when probe.mode is safe and probe.mode is paused
              then { enable parked } }
            rule parked { runs on ground severity info starts disabled
              when probe.mode is safe
              then { send probe pause_descent } }
            """;
        var codes = TestCatalogue.Check(text).Warnings.Select(w => w.Code).ToArray();
        Assert.Equal([DiagnosticCode.ContradictoryBounds, DiagnosticCode.NeverEnabled], codes);
        Assert.Empty(TestCatalogue.Check(text.Replace("and probe.mode is paused", "")).Warnings);
    }

    [Fact]
    public void An_exclusion_naming_a_rule_that_never_commands_the_target_warns()
    {
        var text = Rule("probe.mode is safe") + "\nexclusive probe.head (r)";
        // "exclusive probe.head (" is 22 characters.
        AssertAt(Assert.Single(TestCatalogue.Check(text).Warnings), DiagnosticCode.UnusedExclusion, 4, 23);
    }

    [Fact]
    public void Errors_and_warnings_are_listed_apart_and_in_place_order()
    {
        var text = Rule("probe.head_temp above 500 K and probe.head_temp below 400 K") + "\n"
            + "rule s { runs on ground severity low priority 1\nwhen probe.nose above 1 K\nthen { send probe enter_safe_mode } }";
        var result = TestCatalogue.Check(text);
        Assert.Equal([DiagnosticCode.UnknownPoint], result.Errors.Select(e => e.Code));
        Assert.Equal([DiagnosticCode.ContradictoryBounds], result.Warnings.Select(w => w.Code));
        Assert.All(result.Errors, e => Assert.Equal(DiagnosticSeverity.Error, e.Severity));
    }
}
