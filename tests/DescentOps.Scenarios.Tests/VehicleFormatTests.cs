using DescentOps.Scenarios.Loading;
using DescentOps.Scenarios.Model;

namespace DescentOps.Scenarios.Tests;

/// <summary>The vehicle and acoustics fields: read as written, defaults that keep the original vehicle, and located errors.</summary>
public sealed class VehicleFormatTests
{
    private const string File = "bad.yaml";

    private static ScenarioError SingleError(string text)
    {
        var exception = Assert.Throws<ScenarioException>(() => ScenarioLoader.LoadText(text, File));
        return Assert.Single(exception.Errors);
    }

    [Fact]
    public void The_fixtures_vehicles_are_read_in_SI()
    {
        var scenario = ScenarioLoader.LoadText(ScenarioText.Default, "every-field.yaml");
        var original = scenario.Vehicles[0];
        Assert.False(original.UsesExtendedModel);
        Assert.Equal(VehicleModel.DefaultMaxOutOfRangeS, original.MaxOutOfRangeS);

        var surveyor = scenario.Vehicles[1];
        Assert.Equal(VehicleTask.SeafloorSurvey, surveyor.Task);
        Assert.Equal(Math.PI / 4, surveyor.HeadingRad, 12);
        Assert.Equal(0.02, surveyor.Current!.SpeedMPerS, 12);
        Assert.Equal(new DockSettings(0.4, 200.0, 3), surveyor.Dock);
        Assert.Equal(6 * 3600.0, surveyor.MaxOutOfRangeS, 9);
        Assert.Equal(1200.0, surveyor.SampleTimeS, 9);

        var glider = scenario.Vehicles[2];
        Assert.Equal(VehicleKind.Glider, glider.Kind);
        Assert.Equal(25 * Math.PI / 180, glider.Glider!.GlideAngleRad, 12);

        Assert.Equal(12e3, scenario.Acoustics!.FrequencyHz, 9);
        Assert.Equal(AbsorptionFormula.AinslieMcColm, scenario.Acoustics.Formula);
        var fault = scenario.Faults.Single(f => f.Kind == FaultKind.VehicleLoss);
        var loss = Assert.IsType<FaultEffect.VehicleLoss>(fault.Effect);
        Assert.Equal(("wisp-2", VehicleLossCause.Entrapment), (loss.Vehicle, loss.Cause));
    }

    [Fact]
    public void A_glider_without_its_trim_is_refused_at_the_vehicle()
    {
        var text = ScenarioText.DefaultWith("    glider:\n      net_buoyancy: 0.3 kg\n      glide_angle: 25 deg\n      lift_slope: 132.5\n      drag_offset: 2.15\n      drag_quadratic: 25\n      pump_efficiency: 0.5\n", "");
        var error = SingleError(text);
        Assert.Equal("vehicles[2].glider", error.FieldPath);
        Assert.Equal(ScenarioText.LineOf(text, "- name: wisp-3"), error.Location.Line);
    }

    [Fact]
    public void A_glide_shallower_than_the_wing_can_fly_is_refused()
    {
        // Shallowest glide atan(2·√(25 · 2.15)/132.5) ≈ 6.3° (computed); 5° cannot be trimmed.
        var text = ScenarioText.DefaultWith("      glide_angle: 25 deg", "      glide_angle: 5 deg");
        var error = SingleError(text);
        Assert.Equal("vehicles[2].glider.glide_angle", error.FieldPath);
        Assert.Contains("steady glide", error.Message);
    }

    [Fact]
    public void A_propeller_vehicle_takes_propulsion_power_or_a_hull_not_both()
    {
        var text = ScenarioText.DefaultWith("    speed: 0.35 m/s\n", "    speed: 0.35 m/s\n    propulsion_power: 30 W\n");
        Assert.Equal("vehicles[1].propulsion_power", SingleError(text).FieldPath);
    }

    [Fact]
    public void A_vehicle_loss_names_a_vehicle_that_exists()
    {
        var text = ScenarioText.DefaultWith("    vehicle: wisp-2\n", "    vehicle: wisp-9\n");
        var error = SingleError(text);
        Assert.Equal("faults[1].vehicle", error.FieldPath);
        Assert.Equal(ScenarioText.LineOf(text, "vehicle: wisp-9"), error.Location.Line);
    }

    [Fact]
    public void A_vehicle_loss_needs_its_cause()
    {
        var text = ScenarioText.DefaultWith("    cause: entrapment\n", "");
        Assert.Equal("faults[1].vehicle", SingleError(text).FieldPath);
    }

    [Fact]
    public void An_ocean_outside_the_absorption_fit_is_refused_at_the_ocean_salinity()
    {
        // The fixture's ocean holds 12 g/kg (practical salinity about 11.9); Francois-Garrison was fitted for 30 to 35.
        var text = ScenarioText.DefaultWith("  absorption: ainslie_mccolm", "  absorption: francois_garrison");
        var error = Assert.Single(RunEnvelope.Errors(ScenarioLoader.LoadText(text, File)));
        Assert.Equal("shell.ocean_salinity", error.FieldPath);
        Assert.Contains("Francois-Garrison", error.Message);
        Assert.Contains("practicalSalinity = 11.9", error.Message);
        Assert.Contains("[30, 35]", error.Message);
        Assert.Equal(ScenarioText.LineOf(text, "ocean_salinity: 12 g/kg"), error.Location.Line);
    }

    [Fact]
    public void A_return_level_below_the_reserve_is_refused()
    {
        var text = ScenarioText.DefaultWith("      return_at: 0.4", "      return_at: 0.1");
        Assert.Equal("vehicles[1].dock.return_at", SingleError(text).FieldPath);
    }

    [Fact]
    public void A_branch_cannot_strike_a_vehicle_the_parent_does_not_have()
    {
        var parent = ScenarioLoader.LoadText(ScenarioText.Default, "every-field.yaml");
        const string known = "add_faults:\n  - name: flat\n    kind: vehicle_loss\n    at: 160 d\n    vehicle: wisp-1\n    cause: battery\n";
        Assert.Contains(parent.Vehicles, v => v.Name == "wisp-1");
        Assert.Equal("wisp-1", ScenarioLoader.LoadChange(known, "change.yaml").ApplyTo(parent).Faults[^1].Effect is FaultEffect.VehicleLoss { Vehicle: var v } ? v : null);

        var unknown = ScenarioLoader.LoadChange(known.Replace("wisp-1", "wisp-7", StringComparison.Ordinal), "change.yaml");
        var exception = Assert.Throws<ScenarioException>(() => unknown.ApplyTo(parent));
        Assert.Contains("wisp-7", Assert.Single(exception.Errors).Message);
    }
}
