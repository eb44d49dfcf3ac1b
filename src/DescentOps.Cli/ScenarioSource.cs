using DescentOps.Scenarios;
using DescentOps.Scenarios.Loading;
using DescentOps.Scenarios.Model;

namespace DescentOps.Cli;

/// <summary>Resolves the SCENARIO argument: a file path, a built-in name, or nothing for the default.</summary>
public static class ScenarioSource
{
    public static Scenario Load(string? argument)
    {
        if (string.IsNullOrEmpty(argument)) return BuiltInScenarios.Default();
        if (File.Exists(argument)) return ScenarioLoader.LoadFile(argument);
        if (BuiltInScenarios.Names.Contains(argument))
        {
            return ScenarioLoader.LoadText(BuiltInScenarios.Text(argument), "builtin:" + argument);
        }

        throw new ScenarioException([new ScenarioError(new SourceLocation(argument, 1, 1), "",
            $"no such file, and no built-in scenario of that name (built in: {string.Join(", ", BuiltInScenarios.Names)})")]);
    }
}
