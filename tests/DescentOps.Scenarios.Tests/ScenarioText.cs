namespace DescentOps.Scenarios.Tests;

/// <summary>The repository's scenario files, copied beside the tests, and edits of them for error cases.</summary>
internal static class ScenarioText
{
    public static string Default => File.ReadAllText(Path.Combine(AppContext.BaseDirectory, "scenarios", "default.yaml"));

    /// <summary>The default scenario with one exact line replaced; fails loudly if the line is not there.</summary>
    public static string DefaultWith(string line, string replacement)
    {
        var text = Default;
        Assert.Contains(line, text);
        return text.Replace(line, replacement, StringComparison.Ordinal);
    }

    /// <summary>1-based line number of the first line containing <paramref name="fragment"/>.</summary>
    public static int LineOf(string text, string fragment) =>
        Array.FindIndex(text.Split('\n'), l => l.Contains(fragment, StringComparison.Ordinal)) + 1;
}
