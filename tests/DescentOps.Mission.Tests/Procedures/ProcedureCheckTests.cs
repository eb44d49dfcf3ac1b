using DescentOps.Mission.Autonomy;
using DescentOps.Mission.Procedures;
using DescentOps.Rules.Text;
using DescentOps.Tests.Shared;

namespace DescentOps.Mission.Tests.Procedures;

/// <summary>
/// Procedures are checked as rules are: each mistake is an error at its place in the file (line, column, field path),
/// and a rule can start only a procedure the mission has, and only from the ground.
/// </summary>
public sealed class ProcedureCheckTests
{
    private const string Template = """
        procedures:
          - name: recover
            steps:
              - name: boost
                send: SEND
                wait_for: WAIT
                within: 3 h
                on_fail: GOTO
              - name: fallback
                send: probe enter_safe_mode
        """;

    private static string Block(string send = "probe.wall set_power(power = 3 kW)", string wait = "probe.wall_power above 2.5 kW", string @goto = "fallback") =>
        TestScenario.Of(Template, "block").Replace("SEND", send).Replace("WAIT", wait).Replace("GOTO", @goto).Text;

    private static (DescentOps.Scenarios.Loading.ScenarioError Error, string Line) SingleError(string block)
    {
        var scenario = ProcedureFixtures.WithProcedures(block);
        var error = Assert.Single(MissionProcedures.Errors(scenario));
        return (error, scenario.SourceText.Split('\n')[error.Location.Line - 1]);
    }

    [Fact]
    public void A_well_formed_procedure_has_no_errors()
    {
        Assert.Empty(MissionProcedures.Errors(ProcedureFixtures.WithProcedures(Block())));
    }

    [Fact]
    public void An_unknown_point_in_a_wait_is_refused_at_its_column()
    {
        var (error, line) = SingleError(Block(wait: "probe.wall_heat above 2.5 kW"));
        Assert.Equal("procedures[0].steps[0].wait_for", error.FieldPath);
        Assert.StartsWith("UnknownPoint:", error.Message, StringComparison.Ordinal);
        Assert.Equal("probe.wall_heat", line[(error.Location.Column - 1)..].Split(' ')[0]);
    }

    [Fact]
    public void A_true_state_point_in_a_wait_is_refused_as_in_a_rule()
    {
        var (error, _) = SingleError(Block(wait: "probe.lateral_drift above 1 m"));
        Assert.StartsWith("TrueStateOnly:", error.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void An_unknown_command_is_refused_at_the_send()
    {
        var (error, line) = SingleError(Block(send: "probe.tail wag"));
        Assert.Equal("procedures[0].steps[0].send", error.FieldPath);
        Assert.StartsWith("UnknownCommand:", error.Message, StringComparison.Ordinal);
        Assert.StartsWith("        send: probe.tail", line, StringComparison.Ordinal);
    }

    [Fact]
    public void A_goto_to_a_missing_step_is_refused()
    {
        var (error, line) = SingleError(Block(@goto: "fallbak"));
        Assert.Equal("procedures[0].steps[0].on_fail", error.FieldPath);
        Assert.Contains("has no step 'fallbak'", error.Message, StringComparison.Ordinal);
        Assert.Contains("on_fail: fallbak", line, StringComparison.Ordinal);
    }

    [Fact]
    public void A_step_no_path_reaches_is_refused()
    {
        const string block = """
            procedures:
              - name: recover
                steps:
                  - name: boost
                    send: probe.wall set_power(power = 3 kW)
                    wait_for: probe.wall_power above 2.5 kW
                    within: 3 h
                    on_pass: done
                    on_fail: abort
                  - name: orphan
                    send: probe resume_descent
            """;
        var (error, line) = SingleError(block);
        Assert.Equal("procedures[0].steps[1].name", error.FieldPath);
        Assert.Contains("reaches step 'orphan'", error.Message, StringComparison.Ordinal);
        Assert.Contains("- name: orphan", line, StringComparison.Ordinal);
    }

    [Fact]
    public void A_wait_without_a_time_limit_is_refused()
    {
        var (error, _) = SingleError(TestScenario.Of(Block(), "block").Replace("        within: 3 h\n", "").Text);
        Assert.Equal("procedures[0].steps[0].name", error.FieldPath);
        Assert.Contains("needs 'within'", error.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Steps_that_loop_without_waiting_are_refused()
    {
        const string block = """
            procedures:
              - name: spin
                steps:
                  - name: one
                    send: probe pause_descent
                  - name: two
                    send: probe resume_descent
                    on_pass: one
            """;
        var errors = MissionProcedures.Errors(ProcedureFixtures.WithProcedures(block));
        Assert.Contains(errors, e => e.Message.Contains("go round", StringComparison.Ordinal));
    }

    [Fact]
    public void A_goto_word_is_not_a_step_name()
    {
        var (error, _) = SingleError(TestScenario.Of(Block(), "block").Replace("- name: fallback", "- name: done").Replace("on_fail: fallback", "on_fail: abort").Text);
        Assert.Contains("is a goto word", error.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void A_ground_rule_may_start_a_procedure_of_the_mission_and_no_other()
    {
        var scenario = ProcedureFixtures.WithProcedures(Block());
        var catalogue = MissionCatalogue.For(scenario);
        var ok = Rules.Checking.RuleChecker.CheckSource(new RuleSource("r.dorules", "rule r { runs on ground severity low when probe.regime is FrozenIn then { start recover } }"), catalogue);
        Assert.Empty(ok.Errors);

        var unknown = Rules.Checking.RuleChecker.CheckSource(new RuleSource("r.dorules", "rule r { runs on ground severity low when probe.regime is FrozenIn then { start recovr } }"), catalogue);
        var error = Assert.Single(unknown.Errors);
        Assert.Equal((DiagnosticCode.UnknownProcedure, 1, 81), (error.Code, error.Location.Line, error.Location.Column));
    }

    [Fact]
    public void A_board_rule_cannot_start_a_procedure()
    {
        var catalogue = MissionCatalogue.For(ProcedureFixtures.WithProcedures(Block()));
        var result = Rules.Checking.RuleChecker.CheckSource(new RuleSource("r.dorules", "autonomy E3 rule r { runs on board severity low when probe.regime is FrozenIn then { start recover } }"), catalogue);
        var error = Assert.Single(result.Errors);
        Assert.Equal(DiagnosticCode.PlacementNotAllowed, error.Code);
        Assert.Contains("procedures are run by the ground team", error.Message, StringComparison.Ordinal);
    }
}
