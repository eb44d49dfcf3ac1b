namespace DescentOps.Mission.Tests;

/// <summary>The descentops executable as a user meets it: exit codes, messages, files left behind.</summary>
public sealed class CommandLineTests
{
    [Fact]
    public async Task A_malformed_scenario_is_reported_with_its_location_and_leaves_no_log()
    {
        var folder = ToolProcess.NewTempDirectory();
        var scenario = Path.Combine(folder, "bad.yaml");
        await File.WriteAllTextAsync(scenario, MissionHarness.DefaultText.Replace("  radius: 12 cm", "  radius: 12 kW", StringComparison.Ordinal));
        var log = Path.Combine(folder, "out.jsonl");

        var (exit, _, stderr) = await InProcessTool.RunAsync(folder, "run", scenario, "--log", log);

        Assert.Equal(3, exit); // ExitCode.InvalidInput
        var line = Array.FindIndex(MissionHarness.DefaultText.Split('\n'), l => l.StartsWith("  radius:", StringComparison.Ordinal)) + 1;
        Assert.Contains($"{scenario}:{line}:11: field 'probe.radius'", stderr);
        Assert.DoesNotContain("   at ", stderr); // no stack trace
        Assert.Empty(Directory.GetFiles(folder, "out.jsonl*"));
    }

    [Fact]
    public async Task An_unknown_option_is_a_usage_error()
    {
        var (exit, _, stderr) = await InProcessTool.RunAsync(ToolProcess.NewTempDirectory(), "run", "--sed", "3");
        Assert.Equal(2, exit); // ExitCode.UsageError
        Assert.Contains("--sed", stderr);
    }

    [Fact]
    public async Task A_run_stopped_by_its_time_limit_says_so_in_its_exit_code_and_log()
    {
        var folder = ToolProcess.NewTempDirectory();
        var (exit, stdout, _) = await InProcessTool.RunAsync(folder, "run", "--until", "10 d", "--log", "short.jsonl");
        Assert.Equal(4, exit); // ExitCode.MissionNotCompleted
        Assert.Contains("TimeLimit", stdout);
        var last = File.ReadLines(Path.Combine(folder, "short.jsonl")).Last();
        Assert.Contains("\"outcome\":\"TimeLimit\"", last);
        Assert.Contains("\"final_t\":864000", last); // 10 d × 86400 s/d
    }

    [Fact]
    public async Task Verify_finds_an_edited_line_and_names_it()
    {
        var folder = ToolProcess.NewTempDirectory();
        await InProcessTool.RunAsync(folder, "run", "--until", "2 d", "--log", "a.jsonl");
        var path = Path.Combine(folder, "a.jsonl");
        var lines = await File.ReadAllLinesAsync(path);
        Assert.Equal(0, (await InProcessTool.RunAsync(folder, "verify", path)).ExitCode);

        lines[41] = lines[41].Replace("\"t\":", "\"t\":1", StringComparison.Ordinal);
        await File.WriteAllTextAsync(path, string.Join('\n', lines) + "\n");
        var (exit, stdout, _) = await InProcessTool.RunAsync(folder, "verify", path);
        Assert.Equal(6, exit); // ExitCode.VerificationFailed
        Assert.Contains(":42:", stdout);
    }

    [Fact]
    public async Task Schema_prints_the_committed_schema()
    {
        var (exit, stdout, _) = await InProcessTool.RunAsync(ToolProcess.NewTempDirectory(), "schema");
        Assert.Equal(0, exit);
        Assert.Equal(DescentOps.Scenarios.Format.ScenarioJsonSchema.Generate(), stdout);
    }

    [Fact]
    public async Task Check_locates_a_rule_error_in_the_scenario_file_and_passes_a_good_one()
    {
        var folder = ToolProcess.NewTempDirectory();
        var good = Path.Combine(folder, "good.yaml");
        var bad = Path.Combine(folder, "bad.yaml");
        var text = DescentOps.Scenarios.BuiltInScenarios.Text("stall-wall-boost.yaml");
        await File.WriteAllTextAsync(good, text);
        await File.WriteAllTextAsync(bad, text.Replace("set_power(power = 14 kW)", "set_power(power = 4.5 m)", StringComparison.Ordinal));

        Assert.Equal(0, (await InProcessTool.RunAsync(folder, "check", good)).ExitCode);
        var (exit, stdout, _) = await InProcessTool.RunAsync(folder, "check", bad);
        Assert.Equal(3, exit); // ExitCode.InvalidInput
        var lines = text.Split('\n');
        var line = Array.FindIndex(lines, l => l.Contains("set_power(power = 14 kW)", StringComparison.Ordinal)) + 1;
        Assert.Contains($"{bad}:{line}:", stdout);
        Assert.Contains("UnitMismatch", stdout);
    }
}
