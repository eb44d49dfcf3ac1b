using DescentOps.Scenarios.Loading;
using DescentOps.Scenarios.Model;

namespace DescentOps.Scenarios;

/// <summary>
/// Scenarios compiled into the tool from the repository's scenarios/ folder, so that a run with no file
/// works from any directory.
/// </summary>
public static class BuiltInScenarios
{
    public const string DefaultName = "default.yaml";

    public static IReadOnlyList<string> Names { get; } =
        [.. typeof(BuiltInScenarios).Assembly.GetManifestResourceNames()
            .Where(n => n.StartsWith("scenarios/", StringComparison.Ordinal))
            .Select(n => n["scenarios/".Length..])
            .Order(StringComparer.Ordinal)];

    public static string Text(string name)
    {
        using var stream = typeof(BuiltInScenarios).Assembly.GetManifestResourceStream("scenarios/" + name)
            ?? throw new ArgumentException($"No built-in scenario '{name}'; built in: {string.Join(", ", Names)}.", nameof(name));
        using var reader = new StreamReader(stream);
        return reader.ReadToEnd();
    }

    /// <summary>The default scenario; its source name marks it as built in.</summary>
    public static Scenario Default() => ScenarioLoader.LoadText(Text(DefaultName), "builtin:" + DefaultName);
}
