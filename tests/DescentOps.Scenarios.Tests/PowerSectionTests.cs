using DescentOps.Scenarios.Loading;
using DescentOps.Scenarios.Model;
using DescentOps.Tests.Shared;

namespace DescentOps.Scenarios.Tests;

/// <summary>The optional power section: its values in SI, its defaults, and a located error for each inconsistency.</summary>
public sealed class PowerSectionTests
{
    private const string File = MalformedScenarioTests.File;

    private static ScenarioError SingleError(string text) => MalformedScenarioTests.SingleError(text);

    /// <summary>The fixture with its whole power section removed.</summary>
    private static string WithoutPower()
    {
        var text = ScenarioText.Default;
        var start = text.IndexOf("power:\n", StringComparison.Ordinal);
        var end = text.IndexOf("tether:\n", StringComparison.Ordinal);
        Assert.True(start > 0 && end > start);
        return text[..start] + text[end..];
    }

    [Fact]
    public void The_fixtures_power_section_loads_in_SI_units()
    {
        var power = ScenarioLoader.LoadText(ScenarioText.Default, "every-field.yaml").Power!;
        // Unit conversions by definition: 1 kW = 1000 W, 1 kWh = 3.6e6 J, 15 °C = 288.15 K; "1 yr" is 365 days in UnitsNet.
        Assert.Equal(PowerSourceKind.Radioisotope, power.Source);
        Assert.Equal(40_000, power.ThermalPowerW, 9);
        Assert.Equal(365 * 86400.0, power.FuelAgeS, 6);
        Assert.Equal(8 * 3.6e6, power.Battery!.CapacityJ, 3);
        Assert.Equal(3000, power.Battery.MaxChargePowerW, 9);
        Assert.Equal(288.15, power.Battery.CellTemperatureK, 9);
        Assert.Equal(0.9, power.Battery.InitialStateOfCharge, 12);
        Assert.Equal(["electronics", "head", "wall", "sampling-pump", "jets"], power.Loads.Select(l => l.Name));
        Assert.Equal(new BusLoadModel("sampling-pump", BusLoadRole.Fixed, 3, 400), power.Loads[3]);
        Assert.Equal(0.15, power.Turbine!.CurrentSpeedMPerS, 12);
        Assert.Equal(1030, power.Turbine.WaterDensityKgPerM3, 9);
        Assert.Equal(0.05, power.WasteHeatToHead, 12);
        Assert.Equal(0.2, power.WasteHeatToWall, 12);
    }

    [Fact]
    public void Heat_path_shares_above_one_are_refused_at_their_place()
    {
        var text = ScenarioText.DefaultWith("    wall: 0.2\n", "    wall: 0.97\n");
        var error = Assert.Single(Assert.Throws<ScenarioException>(() => ScenarioLoader.LoadText(text, "heat.yaml")).Errors);
        Assert.Equal("power.heat_path", error.FieldPath);
        Assert.InRange(error.Location.Line, ScenarioText.LineOf(text, "  heat_path:"), ScenarioText.LineOf(text, "    wall: 0.97"));
    }

    [Fact]
    public void Without_the_section_there_is_no_power_system()
    {
        Assert.Null(ScenarioLoader.LoadText(WithoutPower(), "nopower.yaml").Power);
    }

    [Fact]
    public void Omitted_options_take_their_defaults()
    {
        string text = TestScenario.Of(ScenarioText.Default, "every-field.yaml")
            .Replace("    max_charge_power: 3 kW\n", "")
            .Replace("    initial_charge: 0.9\n", "")
            .Replace("    temperature: 15 °C\n", "")
            .Replace("    water_density: 1030 kg/m^3\n", "");
        var start = text.IndexOf("  loads:\n", StringComparison.Ordinal);
        var end = text.IndexOf("  turbine:\n", StringComparison.Ordinal);
        text = text[..start] + text[end..];
        var power = ScenarioLoader.LoadText(text, "defaults.yaml").Power!;
        Assert.Equal(power.Battery!.MaxDischargePowerW, power.Battery.MaxChargePowerW);
        Assert.Equal(1.0, power.Battery.InitialStateOfCharge);
        Assert.Equal(ScenarioLoader.DefaultBatteryTemperatureK, power.Battery.CellTemperatureK);
        Assert.Equal(ScenarioLoader.DefaultWaterDensityKgPerM3, power.Turbine!.WaterDensityKgPerM3);
        // The fixture's probe has jets, so the default bus carries their load too, beside the wall heater.
        Assert.Equal([BusLoadRole.Electronics, BusLoadRole.HeadHeater, BusLoadRole.WallHeater, BusLoadRole.Jets], power.Loads.Select(l => l.Role));
        Assert.Equal([0, 0, 1, 1], power.Loads.Select(l => l.Priority));
    }

    [Fact]
    public void A_fission_source_needs_its_electric_power()
    {
        var text = ScenarioText.DefaultWith("  source: radioisotope\n  thermal_power: 40 kW\n  conversion_efficiency: 0.25\n  degradation_per_year: 0.01\n  fuel_age: 1 yr\n",
            "  source: fission\n  conversion_efficiency: 0.25\n");
        var error = SingleError(text);
        Assert.Equal("power.electric_power", error.FieldPath);
        Assert.Equal(ScenarioText.LineOf(text, "source: fission"), error.Location.Line);
    }

    [Fact]
    public void A_field_of_the_other_source_is_refused_where_it_stands()
    {
        var text = ScenarioText.DefaultWith("  fuel_age: 1 yr\n", "  fuel_age: 1 yr\n  electric_power: 5 kW\n");
        var error = SingleError(text);
        Assert.Equal("power.electric_power", error.FieldPath);
        Assert.Equal(ScenarioText.LineOf(text, "electric_power: 5 kW"), error.Location.Line);
        Assert.Contains("does not belong", error.Message);
    }

    [Fact]
    public void A_fixed_load_needs_its_power_and_a_heater_takes_none()
    {
        var noPower = ScenarioText.DefaultWith("      priority: 3\n      power: 400 W\n", "      priority: 3\n");
        Assert.Equal("power.loads[3].power", SingleError(noPower).FieldPath);

        var heaterPower = ScenarioText.DefaultWith("      role: wall_heater\n      priority: 1\n", "      role: wall_heater\n      priority: 1\n      power: 3 kW\n");
        var error = SingleError(heaterPower);
        Assert.Equal("power.loads[2].power", error.FieldPath);
        Assert.Equal(ScenarioText.LineOf(heaterPower, "role: wall_heater") - 1, error.Location.Line);
    }

    [Fact]
    public void The_bus_needs_exactly_one_head_heater()
    {
        var text = ScenarioText.DefaultWith("      role: head_heater\n", "      role: wall_heater\n");
        var exception = Assert.Throws<ScenarioException>(() => ScenarioLoader.LoadText(text, File));
        Assert.Equal(2, exception.Errors.Count);
        Assert.Contains(exception.Errors, e => e.Message.Contains("exactly one head_heater load, found 0", StringComparison.Ordinal));
        Assert.Contains(exception.Errors, e => e.Message.Contains("exactly one wall_heater load, found 2", StringComparison.Ordinal));
        Assert.All(exception.Errors, e => Assert.Equal(ScenarioText.LineOf(text, "    - name: electronics"), e.Location.Line));
    }

    [Fact]
    public void An_unknown_role_and_an_efficiency_above_one_are_located()
    {
        var role = SingleError(ScenarioText.DefaultWith("      role: fixed\n", "      role: kettle\n"));
        Assert.Equal("power.loads[3].role", role.FieldPath);

        var efficiency = ScenarioText.DefaultWith("    discharge_efficiency: 0.95\n", "    discharge_efficiency: 1.2\n");
        var error = SingleError(efficiency);
        Assert.Equal("power.battery.discharge_efficiency", error.FieldPath);
        Assert.Equal(ScenarioText.LineOf(efficiency, "discharge_efficiency: 1.2"), error.Location.Line);
    }

    [Fact]
    public void A_cut_in_above_the_rated_speed_is_refused()
    {
        var error = SingleError(ScenarioText.DefaultWith("    cut_in_speed: 0.05 m/s\n", "    cut_in_speed: 0.8 m/s\n"));
        Assert.Equal("power.turbine.cut_in_speed", error.FieldPath);
    }

    [Fact]
    public void A_sensor_fault_may_name_the_battery_in_percent()
    {
        var text = ScenarioText.DefaultWith("    remaining_fraction: 0.4\n", "    remaining_fraction: 0.4\n  - name: soc-stuck\n    kind: sensor_stuck\n    at: 2 d\n    point: probe.battery_soc\n    value: 80 %\n");
        var fault = ScenarioLoader.LoadText(text, "soc.yaml").Faults[1];
        // 80 % = 0.8 by definition of the percent.
        Assert.Equal(0.8, Assert.IsType<FaultEffect.SensorStuck>(fault.Effect).ValueSi!.Value, 12);
    }
}
