using DescentOps.Scenarios.Model;

namespace DescentOps.Scenarios.Loading;

/// <summary>Reads the <c>onboard_sampling</c> section; a point or group named twice is an error at its second entry.</summary>
internal static class OnboardSamplingReader
{
    public static OnboardSamplingModel? Read(BoundSection? section, List<ScenarioError> errors)
    {
        if (section is null) return null;
        var entries = new List<(string Name, double IntervalS)>();
        var items = section.List("points");
        for (var i = 0; i < items.Count; i++)
        {
            var name = items[i].Text("name");
            if (entries.Any(e => e.Name == name))
            {
                errors.Add(new ScenarioError(items[i].LocationOf("name"), $"onboard_sampling.points[{i}].name", $"'{name}' is named twice"));
                continue;
            }

            entries.Add((name, items[i].Quantity("interval")));
        }

        return new OnboardSamplingModel(section.OptionalQuantity("interval"), (section.OptionalText("crossings") ?? "exact") == "exact", entries);
    }
}
