using System.Globalization;
using System.Text.Json;
using System.Text.Json.Nodes;
using DescentOps.Scenarios.Loading;
using DescentOps.Scenarios.Model;

namespace DescentOps.Rehearsal;

/// <summary>
/// A fault given at the console, in the scenario's own fault fields as a JSON object
/// (<c>{"name": "dip-1", "kind": "power_dip", "duration": "6 h", "remaining_fraction": 0.3}</c>). It starts at its
/// <c>at</c> (a time still to come), at its <c>at_depth</c>, or, naming neither, at once. The scenario loader checks
/// it exactly as it checks a branch's added fault; a condition or a random start is not offered at the console.
/// </summary>
public static class FaultEntry
{
    public const int MaxLength = 4000;

    private static readonly string[] NotAtTheConsole = ["when", "mean_interval", "not_before", "occurrences"];

    /// <summary>
    /// The fault, or null with a message naming the field in <paramref name="error"/>. <paramref name="nowS"/> is the
    /// simulated time it is checked at; <paramref name="takenNames"/> are the names already in use besides the scenario's.
    /// </summary>
    public static FaultModel? Parse(string json, Scenario scenario, double nowS, IReadOnlyCollection<string> takenNames, out string error)
    {
        error = "";
        if (json.Length > MaxLength)
        {
            error = $"fault: at most {MaxLength} characters";
            return null;
        }

        JsonObject fields;
        try
        {
            fields = JsonNode.Parse(json, documentOptions: new JsonDocumentOptions { MaxDepth = 4 }) as JsonObject
                ?? throw new JsonException("not an object");
        }
        catch (JsonException exception)
        {
            error = $"fault: not a JSON object of fault fields ({exception.Message})";
            return null;
        }

        if (fields.Select(p => p.Key).FirstOrDefault(k => NotAtTheConsole.Contains(k)) is { } refused)
        {
            error = $"{refused}: a fault from the console starts now, at a time ('at') or at a depth ('at_depth')";
            return null;
        }

        if (fields.Select(p => p.Value).FirstOrDefault(v => v is JsonObject or JsonArray) is not null)
        {
            error = "fault: every field is a single value";
            return null;
        }

        if (fields["name"] is JsonValue nameValue && nameValue.TryGetValue<string>(out var name) && takenNames.Contains(name))
        {
            error = $"name: a fault named '{name}' was already given at the console";
            return null;
        }

        var startsNow = !fields.ContainsKey("at") && !fields.ContainsKey("at_depth");
        if (startsNow) fields["at"] = nowS.ToString("R", CultureInfo.InvariantCulture) + " s";
        var text = "add_faults:\n  - " + fields.ToJsonString() + "\n";
        try
        {
            var change = ScenarioLoader.LoadChange(text, "fault");
            change.ApplyTo(scenario);
            var fault = change.AddFaults.Single();
            if (!startsNow && fault.Start is FaultStart.AtTime { AtS: var at } && at < nowS)
            {
                error = string.Create(CultureInfo.InvariantCulture, $"at: {at:R} s is before the simulated time now ({nowS:F0} s)");
                return null;
            }

            return fault;
        }
        catch (InvalidOperationException exception)
        {
            // The loader trips over some refused names instead of reporting them; a field error all the same.
            error = $"fault: {exception.Message}";
            return null;
        }
        catch (ScenarioException exception)
        {
            var first = exception.Errors[0];
            var field = first.FieldPath.StartsWith("add_faults[0].", StringComparison.Ordinal) ? first.FieldPath["add_faults[0].".Length..]
                : first.FieldPath is "add_faults" or "" ? "fault" : first.FieldPath;
            error = $"{field}: {first.Message}";
            return null;
        }
    }
}
