using DescentOps.Scenarios.Loading;
using DescentOps.Scenarios.Model;
using DescentOps.Tests.Shared;

namespace DescentOps.Scenarios.Tests;

/// <summary>The probe's jets section: read in SI units, defaults, and the bus load the jets need.</summary>
public class JetsSectionTests
{
    [Fact]
    public void The_fixtures_jets_are_read_in_SI_units()
    {
        var scenario = ScenarioLoader.LoadText(ScenarioText.Default, "every-field.yaml");
        var jets = scenario.Probe.Jets!;
        Assert.Equal(new ProbeJetsModel(8000.0, 300.0, 0.13, 0.15, 0.7, 0.0), jets);
        Assert.Single(scenario.Power!.Loads, l => l.Role == BusLoadRole.Jets && l.Name == "jets" && l.Priority == 2);
    }

    [Fact]
    public void Defaults_are_the_minimum_hole_and_the_rule_of_thumb_efficiency_and_a_default_bus_gets_a_jets_load()
    {
        string text = TestScenario.Of(ScenarioText.Default, "every-field.yaml")
            .Replace("    hole_radius: 15 cm\n    efficiency: 0.7\n    initial_power: 0 W\n", "");
        var start = text.IndexOf("  loads:\n", StringComparison.Ordinal);
        var end = text.IndexOf("  turbine:\n", StringComparison.Ordinal);
        text = text[..start] + text[end..];
        var scenario = ScenarioLoader.LoadText(text, "defaults.yaml");
        Assert.Equal(0.13, scenario.Probe.Jets!.HoleRadiusM);
        // Common practice of hot-water drilling, 0.6-0.9 of the heat melting the hole; the project takes 0.8.
        Assert.Equal(0.8, scenario.Probe.Jets.Efficiency);
        Assert.Equal(0.0, scenario.Probe.Jets.InitialHeatW);
        Assert.Single(scenario.Power!.Loads, l => l.Role == BusLoadRole.Jets && l.Priority == 1);
    }

    [Fact]
    public void A_jets_load_without_jets_is_refused()
    {
        var text = ScenarioText.Default.Replace(
            "  jets:\n    heat: 8 kW\n    pump_power: 300 W\n    minimum_hole_radius: 13 cm\n    hole_radius: 15 cm\n    efficiency: 0.7\n    initial_power: 0 W\n", "", StringComparison.Ordinal);
        var error = Assert.Throws<ScenarioException>(() => ScenarioLoader.LoadText(text, "x.yaml"));
        Assert.Contains(error.Errors, e => e.FieldPath == "power.loads" && e.Message.Contains("jets", StringComparison.Ordinal));
    }

    [Fact]
    public void Initial_power_above_the_jets_heat_is_refused_at_its_line()
    {
        var text = ScenarioText.DefaultWith("    initial_power: 0 W\n", "    initial_power: 9 kW\n");
        var error = Assert.Throws<ScenarioException>(() => ScenarioLoader.LoadText(text, "x.yaml"));
        var e = Assert.Single(error.Errors);
        Assert.Equal("probe.jets.initial_power", e.FieldPath);
        Assert.Equal(text.Split('\n').ToList().FindIndex(l => l.Contains("initial_power: 9 kW", StringComparison.Ordinal)) + 1, e.Location.Line);
    }
}
