using DescentOps.Physics;
using DescentOps.Scenarios.Model;

namespace DescentOps.Scenarios.Loading;

/// <summary>
/// The one wording of a refusal found before a run: "a run would refuse this scenario", why (the state the scenario
/// takes the model to), and the model's own sentence naming the quantity, the value, the range and the model, placed
/// at the field that sets that state. The run envelope and the mission's preflight both word their refusals here.
/// </summary>
public static class RangeRefusal
{
    private const string Lead = "a run would refuse this scenario";

    /// <summary>A model's refusal at <paramref name="fieldPath"/>, with an optional account of the state that caused it.</summary>
    public static ScenarioError Error(Scenario scenario, string fieldPath, ArgumentException refusal, string? why = null)
    {
        ArgumentNullException.ThrowIfNull(scenario);
        ArgumentNullException.ThrowIfNull(refusal);
        var sentence = refusal is ModelRangeException range ? range.Sentence : refusal.Message.Split(" (Parameter", StringSplitOptions.None)[0].Split('\n')[0].TrimEnd('.');
        return Error(scenario, fieldPath, why is null ? sentence : $"{why}: {sentence}");
    }

    /// <summary>A refusal worded by its caller, at <paramref name="fieldPath"/>.</summary>
    public static ScenarioError Error(Scenario scenario, string fieldPath, string message)
    {
        ArgumentNullException.ThrowIfNull(scenario);
        return new ScenarioError(scenario.LocationOf(fieldPath), fieldPath, $"{Lead}: {message}");
    }

    /// <summary>The field that most likely set the value a descent model refused, from the name of the refused quantity.</summary>
    public static string FieldOf(string? quantity) =>
        quantity switch
        {
            "farFieldTemperatureK" or "baseTemperatureK" or "surfaceTemperatureK" or "temperatureK" => "shell.surface_temperature",
            "geometry" => "probe.mass",
            "headFluxWPerM2" => "probe.radius",
            "pressurePa" or "thicknessM" => "shell.thickness",
            _ => "probe",
        };
}
