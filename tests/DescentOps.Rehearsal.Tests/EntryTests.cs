using System.Text.Json.Nodes;
using DescentOps.Mission.Autonomy;
using DescentOps.Scenarios;
using DescentOps.Scenarios.Model;

namespace DescentOps.Rehearsal.Tests;

public sealed class EntryTests
{
    private static readonly Scenario Scenario = BuiltInScenarios.Default();

    [Fact]
    public void A_command_in_the_rule_words_becomes_the_same_command_a_rule_would_send()
    {
        var command = CommandEntry.Check("send probe.wall set_power(power = 2 kW)", MissionCatalogue.For(Scenario), out var error);
        Assert.Equal("", error);
        Assert.NotNull(command);
        Assert.Equal("probe.wall", command.Target.Name);
        Assert.Equal(2000, command.Arguments.Single().ValueSi);
    }

    [Theory]
    [InlineData("send probe.wall set_power(power = 2 kg)", "command:1:35:", "UnitMismatch")]
    [InlineData("send probe.nose set_power(power = 2 kW)", "command:1:6:", "")]
    [InlineData("probe pause_descent", "command:1:1:", "starts with 'send'")]
    [InlineData("send probe pause_descent } rule x {", "command:1:26:", "cannot appear")]
    public void A_refused_command_says_where_in_the_typed_line(string text, string place, string words)
    {
        Assert.Null(CommandEntry.Check(text, MissionCatalogue.For(Scenario), out var error));
        Assert.StartsWith(place, error, StringComparison.Ordinal);
        Assert.Contains(words, error, StringComparison.Ordinal);
    }

    [Fact]
    public void Every_fault_kind_is_offered_and_its_example_fields_pass_the_scenario_loader()
    {
        Assert.Equal(Enum.GetValues<FaultKind>().Order(), FaultCatalogue.Kinds.Select(k => k.Kind).Order());
        var withVehicle = ScenariosWith("vehicle-flat-battery.yaml");
        foreach (var (kind, word, _, fields) in FaultCatalogue.Kinds)
        {
            var json = new JsonObject { ["name"] = "x-" + word.Replace('_', '-'), ["kind"] = word };
            foreach (var (field, _, example) in fields) json[field] = field == "remaining_fraction" ? double.Parse(example, System.Globalization.CultureInfo.InvariantCulture) : example;
            if (kind == FaultKind.VehicleLoss) json["vehicle"] = withVehicle.Vehicles[0].Name;
            var fault = FaultEntry.Parse(json.ToJsonString(), withVehicle, 500, [], out var error);
            Assert.True(fault is not null, $"{word}: {error}");
            Assert.Equal(kind, fault.Kind);
            Assert.Equal(new FaultStart.AtTime(500), fault.Start);
        }
    }

    [Theory]
    [InlineData("""{"name":"a","kind":"power_dip","remaining_fraction":0.3}""", "duration:")]
    [InlineData("""{"name":"a","kind":"power_sag","duration":"1 h"}""", "kind:")]
    [InlineData("""{"name":"a","kind":"power_dip","duration":"1 h","remaining_fraction":0.3,"when":"probe.depth above 1 m"}""", "when:")]
    [InlineData("""{"name":"a","kind":"power_dip","duration":"1 h","remaining_fraction":0.3,"at":"1 s"}""", "at:")]
    [InlineData("""{"name":"taken","kind":"tilt_kick","angle":"1 deg"}""", "name:")]
    [InlineData("""[1,2]""", "fault:")]
    public void A_bad_fault_is_refused_naming_its_field(string json, string field)
    {
        Assert.Null(FaultEntry.Parse(json, Scenario, 1000, ["taken"], out var error));
        Assert.StartsWith(field, error, StringComparison.Ordinal);
    }

    private static Scenario ScenariosWith(string name) => Scenarios.Loading.ScenarioLoader.LoadText(BuiltInScenarios.Text(name), name);
}
