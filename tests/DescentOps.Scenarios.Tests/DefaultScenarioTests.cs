using DescentOps.Scenarios.Loading;
using DescentOps.Scenarios.Model;

namespace DescentOps.Scenarios.Tests;

public sealed class DefaultScenarioTests
{
    [Fact]
    public void The_built_in_default_is_the_repository_file()
    {
        Assert.Equal(ScenarioText.RepositoryDefault, BuiltInScenarios.Text(BuiltInScenarios.DefaultName));
    }

    [Fact]
    public void The_fixture_loads_with_every_value_in_SI_units()
    {
        var scenario = ScenarioLoader.LoadText(ScenarioText.Default, "every-field.yaml");

        // Unit conversions by definition of the units: 1 cm = 0.01 m, 1 kW = 1000 W, 1 km = 1000 m,
        // 1 kWh = 3.6e6 J, 1 min = 60 s, 1 d = 86400 s, 1 g/kg = 0.001 kg/kg.
        Assert.Equal(0.12, scenario.Probe.RadiusM, 12);
        Assert.Equal(6000.0, scenario.Probe.HeadPowerW, 9);
        Assert.Equal(0.5e-3, scenario.Probe.FreezeGapM, 12);
        Assert.Equal(2500.0, scenario.Shell.ThicknessM, 9);
        Assert.Equal(1.08e12, scenario.Body.DistanceToGroundM, 0);
        Assert.Equal(600.0, scenario.Probe.TelemetryIntervalS, 9);
        Assert.Equal(1.5 * 3.6e6, scenario.Vehicles[0].BatteryEnergyJ, 3);
        Assert.Equal(0.012, scenario.Shell.OceanSalinityKgPerKg, 12);
        Assert.Equal(400 * 86400.0, scenario.Run.UntilS, 6);
        Assert.Equal(30 * 86400.0, Assert.IsType<FaultStart.AtTime>(scenario.Faults[0].Start).AtS, 6);
        Assert.Equal(FaultKind.PowerDip, scenario.Faults[0].Kind);
        Assert.Equal("every-field.yaml", scenario.SourceName);
    }

    [Fact]
    public void Celsius_is_converted_to_Kelvin()
    {
        // 0 °C is 273.15 K by definition of the Celsius scale.
        var text = ScenarioText.DefaultWith("surface_temperature: 132 K", "surface_temperature: -141.15 °C");
        var scenario = ScenarioLoader.LoadText(text, "celsius.yaml");
        Assert.Equal(132.0, scenario.Shell.SurfaceTemperatureK, 9);
    }

    [Fact]
    public void Units_may_be_written_without_a_space()
    {
        var text = ScenarioText.DefaultWith("head_power: 6 kW", "head_power: 6kW");
        Assert.Equal(6000.0, ScenarioLoader.LoadText(text, "nospace.yaml").Probe.HeadPowerW, 9);
    }
}
