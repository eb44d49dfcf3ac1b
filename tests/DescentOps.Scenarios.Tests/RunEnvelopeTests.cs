using DescentOps.Scenarios.Loading;
using DescentOps.Tests.Shared;

namespace DescentOps.Scenarios.Tests;

/// <summary>
/// Ranges checked at load: a scenario whose run would take a model out of its declared range is refused before the
/// run, with the field that sets the state, the value, the model and its range, at the field's place in the file.
/// </summary>
public sealed class RunEnvelopeTests
{
    private const string Thick = "thick-shell-deep-ocean.yaml";

    private static string Edit(params (string Line, string Replacement)[] edits) =>
        edits.Aggregate(TestScenario.BuiltIn(Thick), (text, edit) => text.Replace(edit.Line, edit.Replacement)).Text;

    private static ScenarioError Refusal(string text) =>
        Assert.Single(RunEnvelope.Errors(ScenarioLoader.LoadText(text, "s.yaml")));

    [Fact]
    public void The_built_in_thick_shell_is_within_every_models_range()
    {
        var scenario = ScenarioLoader.LoadText(BuiltInScenarios.Text(Thick), Thick);
        Assert.True(scenario.Shell.ThicknessM >= 20_000);
        Assert.Empty(RunEnvelope.Errors(scenario));
    }

    [Fact]
    public void A_forty_kilometre_shell_is_refused_where_the_absorption_fit_ends_not_at_breakthrough()
    {
        // Francois and Garrison (1982) claim their accuracy to 3.5 km of Earth depth; 40 km of ice at the demo body's
        // 1.0 m/s² press the ocean with some 37 MPa, as hard as about 3.65 km of terrestrial sea (Fofonoff and Millard
        // 1983's depth formula at standard gravity gives 3,657 m for 3,719 dbar, computed by hand beside this test).
        // Water at 272 K and 34 g/kg is inside the fit's other ranges.
        var text = Edit(("thickness: 25 km", "thickness: 40 km"), ("length: 27 km", "length: 42 km"), ("ocean_salinity: 30 g/kg", "ocean_salinity: 34 g/kg\n  ocean_temperature: 272 K"),
            ("  absorption: ainslie_mccolm\n", ""));
        var error = Refusal(text);
        Assert.Equal("shell.thickness", error.FieldPath);
        Assert.Equal(ScenarioText.LineOf(text, "thickness: 40 km"), error.Location.Line);
        Assert.Contains("Francois-Garrison", error.Message, StringComparison.Ordinal);
        Assert.Contains("is outside the valid range [0, 3500] m", error.Message, StringComparison.Ordinal);
        Assert.Matches(@"depthM = 36\d\d\.\d+ m", error.Message);
    }

    [Fact]
    public void A_forty_kilometre_shell_with_a_fit_that_covers_it_loads()
    {
        // Ainslie and McColm (1998) cover 0-7 km and -6 to 35 °C: the same shell over freezing water is within range.
        var text = Edit(("thickness: 25 km", "thickness: 40 km"), ("length: 27 km", "length: 42 km"));
        Assert.Empty(RunEnvelope.Errors(ScenarioLoader.LoadText(text, "s.yaml")));
    }

    [Fact]
    public void An_ocean_colder_than_its_freezing_point_is_refused_at_its_line()
    {
        // TEOS-10 (GSW 3.6.16): 30 g/kg of reference seawater under some 23 MPa freezes near −3.4 °C (269.7 K).
        var text = Edit(("ocean_salinity: 30 g/kg", "ocean_salinity: 30 g/kg\n  ocean_temperature: 269 K"));
        var error = Refusal(text);
        Assert.Equal("shell.ocean_temperature", error.FieldPath);
        Assert.Equal(ScenarioText.LineOf(text, "ocean_temperature: 269 K"), error.Location.Line);
        Assert.Contains("colder than its freezing point 269.", error.Message, StringComparison.Ordinal);
        Assert.Contains("TEOS-10", error.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void An_absorption_temperature_below_freezing_is_refused_at_its_line()
    {
        var text = Edit(("  absorption: ainslie_mccolm", "  absorption: ainslie_mccolm\n  ocean_temperature: 268 K"), ("ocean_salinity: 30 g/kg", "ocean_salinity: 30 g/kg\n  ocean_temperature: 271 K"));
        var error = Refusal(text);
        Assert.Equal("acoustics.ocean_temperature", error.FieldPath);
        Assert.Equal(ScenarioText.LineOf(text, "ocean_temperature: 268 K"), error.Location.Line);
    }

    [Fact]
    public void A_shell_beyond_the_descent_models_pressure_is_refused_at_its_thickness()
    {
        // At 1.0 m/s² a 200 km shell (the format's largest) presses its base with some 187 MPa: the probe's steady descent
        // model (latent heat trusted to 50 MPa) is left halfway down, and that is the one refusal of the field.
        var text = Edit(("thickness: 25 km", "thickness: 200 km"), ("length: 27 km", "length: 202 km"));
        var error = Refusal(text);
        Assert.Equal("shell.thickness", error.FieldPath);
        Assert.Contains("outside the valid range [611.657, 50000000] Pa of the steady descent model", error.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void A_vehicle_diving_beyond_one_hundred_megapascals_is_refused_at_its_profile_depth()
    {
        // Under 25 km of ice the ocean starts near 23 MPa; 80 km more of water at 1.0 m/s² adds some 83 MPa.
        var text = Edit(("profile_depth: 1.5 km", "profile_depth: 80 km"));
        var error = Refusal(text);
        Assert.Equal("vehicles[0].profile_depth", error.FieldPath);
        Assert.Equal(ScenarioText.LineOf(text, "profile_depth: 80 km"), error.Location.Line);
        Assert.Contains("sea pressure", error.Message, StringComparison.Ordinal);
        Assert.Contains("[0, 100000000] Pa", error.Message, StringComparison.Ordinal);
    }
}
