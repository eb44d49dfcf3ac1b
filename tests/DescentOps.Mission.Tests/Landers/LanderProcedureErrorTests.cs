using DescentOps.Mission.Procedures;
using DescentOps.Tests.Shared;

namespace DescentOps.Mission.Tests.Landers;

/// <summary>A lander's own procedures are checked with the lander's mission and their errors name them under the lander.</summary>
public sealed class LanderProcedureErrorTests
{
    private const string Fell = "  - name: fell\n";

    private const string OwnProcedure = """
            procedures:
              - name: brack-recovery
                steps:
                  - name: first
                    send: probe enter_safe_mode
                  - name: second
                    send: probe no_such_command

        """;

    [Fact]
    public void An_error_in_a_landers_own_procedure_names_the_lander_and_the_line()
    {
        var text = TestScenario.BuiltIn("three-landers-shared-link.yaml").InsertBefore(Fell, OwnProcedure);
        var scenario = text.Load();
        var error = Assert.Single(MissionProcedures.Errors(scenario));

        Assert.Equal("landers[1].procedures[0].steps[1].send", error.FieldPath);
        // The line of "send: probe no_such_command" in the edited file, not the file's start.
        var line = text.Text.Split('\n').ToList().FindIndex(l => l.Contains("no_such_command", StringComparison.Ordinal)) + 1;
        Assert.Equal(line, error.Location.Line);
        Assert.Contains("no_such_command", error.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void An_error_in_procedures_the_landers_share_names_the_top_level_once()
    {
        var text = TestScenario.BuiltIn("three-landers-shared-link.yaml")
            .InsertBefore("run:\n", OwnProcedure.Replace("\n    ", "\n", StringComparison.Ordinal).TrimStart());
        var error = Assert.Single(MissionProcedures.Errors(text.Load()));
        Assert.Equal("procedures[0].steps[1].send", error.FieldPath);
    }
}
