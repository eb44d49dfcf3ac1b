using DescentOps.Mission.Running;
using DescentOps.Scenarios;
using DescentOps.Scenarios.Loading;
using DescentOps.Scenarios.Model;

namespace DescentOps.Mission.Tests;

/// <summary>
/// <c>check</c> refuses what <c>run</c> would stop on, and both refuse before writing anything; what is legal but
/// almost certainly a mistake is a warning. Each case below ran to "internal error" (exit 1) or a failed component
/// (exit 5) before the preflight, and passed <c>check</c>.
/// </summary>
[Collection(Cli.InProcessCliCollection.Name)] // the command line in process, with the console captured
public sealed class PreflightTests
{
    private static string DefaultWith(string line, string replacement)
    {
        var text = BuiltInScenarios.Text("default.yaml");
        Assert.Contains(line, text, StringComparison.Ordinal);
        return text.Replace(line, replacement, StringComparison.Ordinal);
    }

    private static Scenario Load(string text) => ScenarioLoader.LoadText(text, "case.yaml");

    [Theory]
    // The conductive lid needs its base at the melting point, which 273.15 K at the surface leaves no room for.
    [InlineData("surface_temperature: 132 K", "surface_temperature: 273.15 K", "shell.surface_temperature", "conductive lid")]
    // 20 K is the format's lower bound, but the steady descent model is valid from 50 K.
    [InlineData("surface_temperature: 132 K", "surface_temperature: 20 K", "shell.surface_temperature", "steady descent model")]
    // 200 km is the format's maximum thickness; the overburden there passes the ice Ih melting curve's pressure range.
    // At the demo body's gravity of 1.0 m/s² the first model a 200 km shell leaves is a pressure range.
    [InlineData("thickness: 2.5 km", "thickness: 200 km", "shell.thickness", "pressure")]
    // 1 kg in 0.109 m³ is lighter than the water it displaces.
    [InlineData("mass: 210 kg", "mass: 1 kg", "probe.mass", "floats")]
    // A radius that underflows gives an infinite head flux.
    [InlineData("radius: 12 cm", "radius: 1e-320 cm", "probe.radius", "head")]
    public void A_scenario_a_run_would_stop_on_is_refused_at_its_field(string line, string replacement, string field, string words)
    {
        var text = DefaultWith(line, replacement);
        var error = Assert.Single(MissionPreflight.Errors(Load(text)));
        Assert.Equal(field, error.FieldPath);
        Assert.Equal(text.Split('\n').ToList().FindIndex(l => l.Contains(replacement, StringComparison.Ordinal)) + 1, error.Location.Line);
        Assert.Contains(words, error.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Every_built_in_scenario_passes_the_preflight_without_warnings()
    {
        foreach (var name in BuiltInScenarios.Names)
        {
            var scenario = ScenarioLoader.LoadText(BuiltInScenarios.Text(name), name);
            Assert.Empty(MissionPreflight.Errors(scenario));
            Assert.Empty(MissionPreflight.Warnings(scenario));
        }
    }

    [Theory]
    [InlineData("length: 3.2 km", "length: 10 m", "tether.length", "shorter than the shell")]
    [InlineData("electronics_power: 60 W", "electronics_power: 100 kW", "probe.electronics_power", "changes nothing else")]
    [InlineData("at: 30 d", "at: 500 d", "faults[0].at", "never happens")]
    [InlineData("distance_to_ground: 1.08e9 km", "distance_to_ground: 0 km", "body.distance_to_ground", "no light time")]
    public void A_likely_mistake_is_a_warning_at_its_field(string line, string replacement, string field, string words)
    {
        var scenario = Load(DefaultWith(line, replacement));
        Assert.Empty(MissionPreflight.Errors(scenario));
        var warning = Assert.Single(MissionPreflight.Warnings(scenario));
        Assert.Equal(field, warning.FieldPath);
        Assert.Contains(words, warning.Message, StringComparison.Ordinal);
    }

    [Fact]
    public async Task Check_and_run_refuse_alike_and_the_refused_run_writes_nothing()
    {
        var folder = ToolProcess.NewTempDirectory();
        await File.WriteAllTextAsync(Path.Combine(folder, "warm.yaml"), DefaultWith("surface_temperature: 132 K", "surface_temperature: 273.15 K"));
        var (checkExit, checkOut, _) = await InProcessTool.RunAsync(folder, "check", "warm.yaml");
        Assert.Equal(3, checkExit); // ExitCode.InvalidInput
        Assert.Contains("field 'shell.surface_temperature'", checkOut, StringComparison.Ordinal);
        var (runExit, _, runErr) = await InProcessTool.RunAsync(folder, "run", "warm.yaml", "--log", "out/warm.jsonl");
        Assert.Equal(3, runExit);
        Assert.Contains("field 'shell.surface_temperature'", runErr, StringComparison.Ordinal);
        Assert.False(Directory.Exists(Path.Combine(folder, "out")));
    }

    [Fact]
    public async Task A_run_whose_log_could_pass_the_limit_is_refused_unless_asked_for()
    {
        // A frame a second for 1000 years: 3.15e10 frames of about 700 bytes, some 22 TB.
        var folder = ToolProcess.NewTempDirectory();
        var text = DefaultWith("telemetry_interval: 10 min", "telemetry_interval: 1 s").Replace("until: 400 d", "until: 365000 d", StringComparison.Ordinal);
        await File.WriteAllTextAsync(Path.Combine(folder, "endless.yaml"), text);
        var (exit, _, stderr) = await InProcessTool.RunAsync(folder, "run", "endless.yaml", "--log", "out/endless.jsonl");
        Assert.Equal(2, exit); // ExitCode.UsageError: the remedy is an option
        Assert.Contains("--no-log-limit", stderr, StringComparison.Ordinal);
        Assert.Contains("TB", stderr, StringComparison.Ordinal);
        Assert.False(Directory.Exists(Path.Combine(folder, "out")));

        var (checkExit, checkOut, _) = await InProcessTool.RunAsync(folder, "check", "endless.yaml");
        Assert.Equal(0, checkExit);
        Assert.Contains("field 'run.until': the log may grow to 22.1 TB", checkOut, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("run", "--until", "1,5 d", "comma")]
    [InlineData("run", "--until", "NaN d", "not a finite number")]
    [InlineData("physics light-time", "--distance", "1,5 au", "comma")]
    [InlineData("physics light-time", "--distance", "1e309 au", "too large")]
    [InlineData("physics light-time", "--distance", "1 AU", "case-sensitive")]
    public async Task A_number_that_could_be_misread_on_the_command_line_is_a_usage_error_naming_the_option(string command, string option, string value, string words)
    {
        var arguments = command.Split(' ').Concat([option, value]).ToArray();
        var (exit, _, stderr) = await InProcessTool.RunAsync(ToolProcess.NewTempDirectory(), arguments);
        Assert.Equal(2, exit); // ExitCode.UsageError
        Assert.Contains(option + ":", stderr, StringComparison.Ordinal);
        Assert.Contains(words, stderr, StringComparison.Ordinal);
    }
}
