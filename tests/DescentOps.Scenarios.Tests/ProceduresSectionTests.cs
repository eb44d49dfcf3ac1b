using DescentOps.Scenarios.Loading;
using DescentOps.Tests.Shared;

namespace DescentOps.Scenarios.Tests;

/// <summary>The procedures section is read as written, in SI; its meaning is checked when a run is assembled.</summary>
public sealed class ProceduresSectionTests
{
    [Fact]
    public void A_procedure_is_read_with_its_steps_times_and_gotos()
    {
        var scenario = ScenarioLoader.LoadText(ScenarioText.Default, "every-field.yaml");

        var procedure = Assert.Single(scenario.Procedures);
        Assert.Equal(("cool-down", 50 * 86400.0, "procedures[0]"), (procedure.Name, procedure.StartAtS, procedure.FieldPath));
        var step = Assert.Single(procedure.Steps);
        Assert.Equal(
            ("lower-head", "probe.head set_power(power = 2 kW)", "probe.head_power below 2.5 kW", 3 * 3600.0, "probe.regime is Melting", "done", "abort"),
            (step.Name, step.Send, step.WaitFor, step.WithinS, step.Expect, step.OnPass, step.OnFail));
        // Field paths locate each field in the file for errors found later.
        Assert.Equal(scenario.SourceText.Split('\n').ToList().FindIndex(l => l.Contains("wait_for: probe.head_power", StringComparison.Ordinal)) + 1,
            scenario.LocationOf(step.FieldPath + ".wait_for").Line);
    }

    [Fact]
    public void A_procedure_without_steps_is_refused_at_its_place()
    {
        string text = TestScenario.Of(ScenarioText.Default, "every-field.yaml").Replace("    steps:\n      - name: lower-head", "    steps: []\n    unused:\n      - name: lower-head");
        var error = Assert.Throws<ScenarioException>(() => ScenarioLoader.LoadText(text, "every-field.yaml"));
        Assert.Contains(error.Errors, e => e.FieldPath.StartsWith("procedures[0]", StringComparison.Ordinal));
    }
}
