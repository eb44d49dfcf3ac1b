using DescentOps.Mission.Autonomy;
using DescentOps.Tests.Shared;

namespace DescentOps.Mission.Tests.Landers;

/// <summary>A lander's own time-tagged telecommands are checked with the lander's mission and their errors name them under the lander.</summary>
public sealed class LanderTelecommandErrorTests
{
    private const string Fell = "  - name: fell\n";

    private const string OwnTelecommands = """
            telecommands:
              - { at: 2 h, from: ground, send: "probe enter_safe_mode" }
              - { at: 3 h, from: ground, send: "probe no_such_command" }

        """;

    [Fact]
    public void An_error_in_a_landers_own_telecommand_names_the_lander_and_the_line()
    {
        // brack is the second lander (index 1): its block ends where fell's begins.
        var text = TestScenario.BuiltIn("three-landers-shared-link.yaml").InsertBefore(Fell, OwnTelecommands);
        var error = Assert.Single(MissionTimeline.Errors(text.Load()));

        Assert.Equal("landers[1].telecommands[1].send", error.FieldPath);
        var line = text.Text.Split('\n').ToList().FindIndex(l => l.Contains("no_such_command", StringComparison.Ordinal)) + 1;
        Assert.Equal(line, error.Location.Line);
        Assert.Contains("no_such_command", error.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Good_telecommands_of_a_lander_give_no_error()
    {
        var text = TestScenario.BuiltIn("three-landers-shared-link.yaml")
            .InsertBefore(Fell, OwnTelecommands.Replace("no_such_command", "resume_descent", StringComparison.Ordinal));
        Assert.Empty(MissionTimeline.Errors(text.Load()));
    }
}
