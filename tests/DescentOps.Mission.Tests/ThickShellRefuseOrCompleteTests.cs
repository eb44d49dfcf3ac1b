using DescentOps.Engine.Running;
using DescentOps.Mission.Running;
using DescentOps.Scenarios;
using DescentOps.Scenarios.Loading;

namespace DescentOps.Mission.Tests;

/// <summary>
/// Issue 13's promise for thick shells: a 40 km shell and a glider under a 25 km shell either run to completion or are
/// refused before the run, at the field that takes a model out of its range, naming the model and the range; never
/// a run that reaches the ocean and then fails at breakthrough or at a vehicle's release. Variants of the built-in
/// thick shell (absorption fit, gravity, ocean salinity and temperature, glider depth) each land on one side or the
/// other, and the side is part of the case; a run may still end in an operational loss (a glider out of range),
/// which is the story the tool exists to tell, not a model failure. Time-compressed like the built-in (a strong head, long telemetry steps),
/// so each completed run takes a few seconds.
/// </summary>
public sealed class ThickShellRefuseOrCompleteTests
{
    /// <summary>The built-in 25 km shell made 40 km deep, as the issue tried it (head and telemetry compressed, a fibre that closes over 42 km).</summary>
    private const string Forty =
        "thickness: 25 km=>thickness: 40 km|length: 27 km=>length: 42 km|head_power: 14 kW=>head_power: 30 kW|" +
        "telemetry_interval: 12 h=>telemetry_interval: 1 d|transceiver: gbe-long-reach=>transceiver: gbe-long-reach\n  attenuation: 0.2";

    /// <summary>The 25 km shell with its glider alone: the sampler is taken out, so the glider's release is what is tried.</summary>
    private const string GliderAlone = "  - name: skate-2\n    task: sampling\n    battery: 1.2 kWh\n    reserve: 0.25\n    hotel_power: 8 W\n    propulsion_power: 30 W\n    speed: 0.35 m/s\n    profile_depth: 600 m\n    sample_time: 2 h\n=>";

    private static string Build(string edits)
    {
        var text = BuiltInScenarios.Text("thick-shell-deep-ocean.yaml");
        foreach (var edit in edits.Split('|', StringSplitOptions.RemoveEmptyEntries))
        {
            var parts = edit.Split("=>", 2, StringSplitOptions.None);
            Assert.Contains(parts[0], text, StringComparison.Ordinal);
            text = text.Replace(parts[0], parts[1], StringComparison.Ordinal);
        }

        return text;
    }

    [Theory]
    // 40 km under the Ainslie-McColm fit (0-7 km of Earth depth): the ocean's 37 MPa is some 3.7 km, inside it.
    [InlineData("40 km, Ainslie-McColm", Forty, "completed")]
    // 40 km under Francois-Garrison: the water at its freezing point (about −3.6 °C under 37 MPa) is colder than the fit's
    // −2 °C (their 1982 paper's range), the first range the run would leave, at the temperature's own field.
    [InlineData("40 km, Francois-Garrison", Forty + "|  absorption: ainslie_mccolm\n=>", "refused: shell.ocean_temperature: Francois-Garrison")]
    // 40 km at 1.3 m/s² (the issue's gravity): the base is pressed with some 48 MPa, below the steady descent model's
    // 50 MPa, and the ocean is some 4.8 km of Earth depth for the absorption fit.
    [InlineData("40 km at 1.3 m/s²", Forty + "|gravity: 1.0 m/s^2=>gravity: 1.3 m/s^2", "completed")]
    // The glider alone under 25 km, in water at its freezing point (about −3.4 °C): TEOS-10 covers it.
    [InlineData("25 km glider", GliderAlone, "completed")]
    // The same glider in fresh water: Ainslie and McColm fitted 5 to 50 of practical salinity, so it is refused there.
    [InlineData("25 km glider, fresh ocean", GliderAlone + "|ocean_salinity: 30 g/kg=>ocean_salinity: 0 g/kg", "refused: shell.ocean_salinity: Ainslie-McColm")]
    // The same glider with its acoustic link on Francois-Garrison, whose temperature range starts at −2 °C: refused
    // where that temperature comes from (the water here is some 1.4 K colder).
    [InlineData("25 km glider, Francois-Garrison", GliderAlone + "|  absorption: ainslie_mccolm\n=>", "refused: shell.ocean_temperature: Francois-Garrison")]
    // The glider diving 4 km below the ice (some 27 MPa): down and up at 25° its profile runs some 17 km out
    // (2 · 4 km / tan 25°), within the 24 km the acoustic link closes at 12 kHz.
    [InlineData("25 km glider diving 4 km", GliderAlone + "|profile_depth: 1.5 km=>profile_depth: 4 km", "completed")]
    // Diving 20 km (some 43 MPa, inside TEOS-10's 100 MPa) the glide leaves the link's 24 km before the profile's end:
    // every model holds, and the run tells the operational story, the glider lost out of range.
    [InlineData("25 km glider diving 20 km", GliderAlone + "|profile_depth: 1.5 km=>profile_depth: 20 km", "lost: out of acoustic range too long")]
    public async Task Either_runs_its_course_or_is_refused_at_load_with_its_field_and_range(string name, string edits, string expected)
    {
        var text = Build(edits);
        var scenario = ScenarioLoader.LoadText(text, "variant.yaml");
        var errors = MissionPreflight.Errors(scenario);
        if (expected.StartsWith("refused: ", StringComparison.Ordinal))
        {
            var parts = expected["refused: ".Length..].Split(": ", 2);
            var error = Assert.Single(errors);
            Assert.Equal(parts[0], error.FieldPath);
            Assert.True(error.Location.Line > 1, $"{name}: the refusal is placed at its field's line, not the file's start");
            Assert.Contains(parts[1], error.Message, StringComparison.Ordinal);
            Assert.Contains("outside the valid range [", error.Message, StringComparison.Ordinal);
            return;
        }

        Assert.True(errors.Count == 0, $"{name}: refused: {string.Join("; ", errors)}");
        var (summary, sink) = await MissionHarness.RunAsync(scenario);

        // Never a model failure after the descent: no component failed, nothing aborted, the ocean was reached and every
        // vehicle released ends its task or is lost for an operational reason the log names.
        Assert.Equal(0, summary.ComponentFailures);
        Assert.Empty(sink.OfKind("component.failed"));
        Assert.Single(sink.OfKind("probe.breakthrough"));
        Assert.Equal(scenario.Vehicles.Count, sink.OfKind("vehicle.released").Count());
        if (expected == "completed")
        {
            Assert.True(summary.Outcome.Kind == RunOutcomeKind.Completed, $"{name}: {summary.Outcome.Kind}");
            Assert.Equal(scenario.Vehicles.Count, sink.OfKind("vehicle.task_complete").Count());
        }
        else
        {
            Assert.Equal(RunOutcomeKind.MissionLost, summary.Outcome.Kind);
            var lost = Assert.Single(sink.OfKind("vehicle.lost"));
            Assert.Equal(expected["lost: ".Length..], CollectingSink.TextField(lost, "reason"));
        }
    }
}
