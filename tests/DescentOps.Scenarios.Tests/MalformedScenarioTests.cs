using DescentOps.Scenarios.Loading;
using DescentOps.Tests.Shared;

namespace DescentOps.Scenarios.Tests;

/// <summary>Each malformed input gets one clear error with its file, line, column and field path.</summary>
public sealed class MalformedScenarioTests
{
    internal const string File = "bad.yaml";

    /// <summary>Loads <paramref name="text"/> as "bad.yaml", expecting exactly one error, located in that file.</summary>
    internal static ScenarioError SingleError(string text)
    {
        var exception = Assert.Throws<ScenarioException>(() => ScenarioLoader.LoadText(text, File));
        var error = Assert.Single(exception.Errors);
        Assert.Equal(File, error.Location.File);
        return error;
    }

    [Fact]
    public void A_YAML_syntax_error_is_located()
    {
        var text = ScenarioText.DefaultWith("  radius: 12 cm", "  radius: [12 cm");
        var error = SingleError(text);
        Assert.Contains("YAML syntax", error.Message);
        // The parser notices the unclosed '[' when the flow sequence meets the next line's key.
        Assert.InRange(error.Location.Line, ScenarioText.LineOf(text, "radius: [12 cm"), ScenarioText.LineOf(text, "radius: [12 cm") + 1);
    }

    [Fact]
    public void An_unknown_field_is_named_with_its_path()
    {
        var text = ScenarioText.DefaultWith("  mass: 210 kg", "  mass: 210 kg\n  colour: orange");
        var error = SingleError(text);
        Assert.Equal("probe.colour", error.FieldPath);
        Assert.Equal(ScenarioText.LineOf(text, "colour: orange"), error.Location.Line);
        Assert.Equal(3, error.Location.Column);
        Assert.Contains("unknown field", error.Message);
    }

    [Fact]
    public void A_missing_field_is_named_at_its_section()
    {
        var text = ScenarioText.DefaultWith("  head_power: 6 kW\n", "");
        var error = SingleError(text);
        Assert.Equal("probe.head_power", error.FieldPath);
        Assert.Equal(ScenarioText.LineOf(text, "  name: Wendlow"), error.Location.Line);
        Assert.Contains("missing required field", error.Message);
    }

    [Fact]
    public void A_negative_length_is_out_of_range()
    {
        var text = ScenarioText.DefaultWith("  radius: 12 cm", "  radius: -12 cm");
        var error = SingleError(text);
        Assert.Equal("probe.radius", error.FieldPath);
        Assert.Equal(ScenarioText.LineOf(text, "radius: -12 cm"), error.Location.Line);
        Assert.Equal(11, error.Location.Column);
        Assert.Contains("out of range", error.Message);
    }

    [Fact]
    public void A_unit_of_the_wrong_dimension_is_refused()
    {
        var text = ScenarioText.DefaultWith("  length: 2.4 m", "  length: 2.4 kW");
        var error = SingleError(text);
        Assert.Equal("probe.length", error.FieldPath);
        Assert.Contains("is not a length", error.Message);
    }

    [Fact]
    public void A_number_without_a_unit_asks_for_one()
    {
        var text = ScenarioText.DefaultWith("  radius: 12 cm", "  radius: 12");
        var error = SingleError(text);
        Assert.Contains("a unit is required", error.Message);
    }

    [Fact]
    public void Errors_in_a_list_name_the_entry()
    {
        var text = ScenarioText.DefaultWith("    speed: 0.35 m/s", "    speed: fast");
        var error = SingleError(text);
        Assert.Equal("vehicles[1].speed", error.FieldPath);
    }

    [Fact]
    public void Every_problem_is_reported_not_only_the_first()
    {
        var text = TestScenario.Of(ScenarioText.Default, "every-field.yaml").Replace("  radius: 12 cm", "  radius: -1 m").Replace("  length: 2.4 m", "  length: 2.4 kW").Text;
        var exception = Assert.Throws<ScenarioException>(() => ScenarioLoader.LoadText(text, File));
        Assert.Equal(["probe.radius", "probe.length"], exception.Errors.Select(e => e.FieldPath));
    }

    [Fact]
    public void A_power_dip_without_a_duration_is_refused()
    {
        var text = ScenarioText.DefaultWith("    duration: 12 h\n", "");
        var error = SingleError(text);
        Assert.Equal("faults[0].duration", error.FieldPath);
    }

    [Fact]
    public void A_missing_file_is_a_scenario_error_not_a_crash()
    {
        var exception = Assert.Throws<ScenarioException>(() => ScenarioLoader.LoadFile(Path.Combine(Path.GetTempPath(), "no-such-scenario.yaml")));
        Assert.Contains("cannot read", Assert.Single(exception.Errors).Message);
    }
}
