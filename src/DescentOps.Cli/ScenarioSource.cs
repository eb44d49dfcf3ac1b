using DescentOps.Scenarios;
using DescentOps.Scenarios.Loading;
using DescentOps.Scenarios.Model;

namespace DescentOps.Cli;

/// <summary>
/// Resolves a SCENARIO argument the same way in every command: a file path, else a built-in name (with or without
/// its <c>.yaml</c>), or nothing for the default.
/// </summary>
public static class ScenarioSource
{
    public static Scenario Load(string? argument)
    {
        if (string.IsNullOrEmpty(argument)) return BuiltInScenarios.Default();
        if (File.Exists(argument)) return ScenarioLoader.LoadFile(argument);
        if (BuiltInName(argument) is { } name) return ScenarioLoader.LoadText(BuiltInScenarios.Text(name), "builtin:" + name);
        throw NotFound(argument);
    }

    /// <summary>The scenario's text and the name it is shown under, for a file or a built-in scenario.</summary>
    public static (string Text, string SourceName) Text(string argument)
    {
        if (File.Exists(argument)) return (File.ReadAllText(argument), argument);
        if (BuiltInName(argument) is { } name) return (BuiltInScenarios.Text(name), "builtin:" + name);
        throw NotFound(argument);
    }

    /// <summary>The file a SCENARIO argument reads, or null for a built-in scenario.</summary>
    public static string? FilePath(string? argument) => argument is not null && File.Exists(argument) ? argument : null;

    /// <summary>The built-in scenario an argument names (<c>tilt-steering</c> or <c>tilt-steering.yaml</c>), or null.</summary>
    public static string? BuiltInName(string argument)
    {
        ArgumentNullException.ThrowIfNull(argument);
        if (BuiltInScenarios.Names.Contains(argument)) return argument;
        var withExtension = argument + ".yaml";
        return BuiltInScenarios.Names.Contains(withExtension) ? withExtension : null;
    }

    private static FileNotFoundException NotFound(string argument) =>
        new($"no such file, and no built-in scenario of that name: {argument} (built in: {string.Join(", ", BuiltInScenarios.Names.Select(n => n[..^".yaml".Length]))}; 'descentops scenarios list' describes them)", argument);
}
