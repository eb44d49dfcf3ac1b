using DescentOps.Primitives.Identity;
using DescentOps.Primitives.Units;
using DescentOps.Rules.Catalogue;
using DescentOps.Rules.Checking;
using DescentOps.Rules.Text;

namespace DescentOps.Rules.Tests;

/// <summary>
/// What a condition may read (true state only in fault triggers) and a telecommand written alone, checked as a
/// rule's send is. The catalogue is the test catalogue's kind: round ranges for an invented probe, not a design.
/// </summary>
public sealed class CatalogueViewTests
{
    private static readonly TelemetryCatalogue Catalogue = new(
        [
            new NumericPointSpec("probe.depth", PhysicalDimension.Length, 0.0, 5000.0),
            new NumericPointSpec("probe.lateral_drift", PhysicalDimension.Length, -5000.0, 5000.0) { TrueStateOnly = true },
            new DiscretePointSpec("station.alive", ["yes", "no"]) { GroundOnly = true },
        ],
        [new CommandSpec(new ComponentId("probe.head"), "set_power", [new QuantityArgumentSpec("power", PhysicalDimension.Power, 0.0, 8000.0)])]);

    private const string Drifting = "rule r { runs on ground severity low when probe.lateral_drift above 5 m then { } }";

    [Fact]
    public void A_true_state_point_is_refused_in_a_rule_and_read_through_the_fault_trigger_view()
    {
        var error = Assert.Single(RuleChecker.CheckSource(new RuleSource("r.dorules", Drifting), Catalogue).Errors);
        // "rule r { runs on ground severity low when " is 9 + 15 + 13 + 5 = 42 characters: the point starts at column 43.
        Assert.Equal((DiagnosticCode.TrueStateOnly, 1, 43), (error.Code, error.Location.Line, error.Location.Column));
        Assert.True(RuleChecker.CheckSource(new RuleSource("r.dorules", Drifting), Catalogue.ForFaultTriggers()).Succeeded);
        Assert.True(RuleChecker.CheckSource(new RuleSource("r.dorules", Drifting.Replace("lateral_drift", "depth", StringComparison.Ordinal)), Catalogue).Succeeded);
    }

    [Fact]
    public void A_ground_only_point_is_read_by_a_ground_rule_and_refused_on_board_and_in_a_fault_trigger()
    {
        const string Ground = "rule r { runs on ground severity low when station.alive is no then { } }";
        Assert.True(RuleChecker.CheckSource(new RuleSource("r.dorules", Ground), Catalogue).Succeeded);

        var board = Ground.Replace("on ground", "on board", StringComparison.Ordinal);
        var error = Assert.Single(RuleChecker.CheckSource(new RuleSource("r.dorules", board), Catalogue).Errors);
        // "rule r { runs on board severity low when " is 9 + 14 + 13 + 5 = 41 characters: the point starts at column 42.
        Assert.Equal((DiagnosticCode.GroundOnly, 1, 42), (error.Code, error.Location.Line, error.Location.Column));
        Assert.Equal(DiagnosticCode.GroundOnly, Assert.Single(RuleChecker.CheckSource(new RuleSource("r.dorules", Ground), Catalogue.ForFaultTriggers()).Errors).Code);
    }

    [Theory]
    // Column of the first error within the command text (1-based): "probe.head set_power(power = " is 29 characters, so
    // a value starts at 30; "probe.head " is 11, so the command name at 12; after the 34-character command and a space, a stray word starts at 36.
    [InlineData("probe.head set_power(power = 2 kW)", null, 0)]
    [InlineData("probe.head set_power(power = 2 m)", DiagnosticCode.UnitMismatch, 30)]
    [InlineData("probe.head set_power(power = 9 kW)", DiagnosticCode.ArgumentOutOfRange, 30)]
    [InlineData("probe.head set_power", DiagnosticCode.MissingArgument, 12)]
    [InlineData("probe.head set_power(power = 2 kW) now", DiagnosticCode.UnexpectedToken, 36)]
    [InlineData("send probe.head set_power(power = 2 kW)", DiagnosticCode.InvalidName, 1)]
    public void A_command_alone_is_checked_as_a_send_is(string text, DiagnosticCode? code, int column)
    {
        var (command, errors) = RuleChecker.CheckCommand(new RuleSource("t", text), Catalogue);
        if (code is null)
        {
            Assert.Empty(errors);
            Assert.Equal("probe.head set_power(power=2000)", command!.ToString());
            return;
        }

        Assert.Null(command);
        Assert.Equal((code.Value, column), (errors[0].Code, errors[0].Location.Column));
    }
}
