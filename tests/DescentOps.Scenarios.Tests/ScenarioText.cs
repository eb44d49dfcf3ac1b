namespace DescentOps.Scenarios.Tests;

/// <summary>
/// The test fixture that uses every field of the format, and edits of it for error cases. Loader tests use the
/// fixture, not the demo scenario, so that redesigning the demo mission does not touch them.
/// </summary>
internal static class ScenarioText
{
    public static string Default => File.ReadAllText(Path.Combine(AppContext.BaseDirectory, "Fixtures", "every-field.yaml"));

    public static string RepositoryDefault => File.ReadAllText(Path.Combine(AppContext.BaseDirectory, "scenarios", "default.yaml"));

    /// <summary>The default scenario with one exact text replaced; fails loudly unless it occurs exactly once.</summary>
    public static string DefaultWith(string line, string replacement) =>
        DescentOps.Tests.Shared.TestScenario.Of(Default, "every-field.yaml").Replace(line, replacement).Text;

    /// <summary>1-based line number of the first line containing <paramref name="fragment"/>.</summary>
    public static int LineOf(string text, string fragment) =>
        Array.FindIndex(text.Split('\n'), l => l.Contains(fragment, StringComparison.Ordinal)) + 1;
}
