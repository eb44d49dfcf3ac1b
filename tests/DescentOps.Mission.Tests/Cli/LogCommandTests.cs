using System.Text.Json;

namespace DescentOps.Mission.Tests.Cli;

/// <summary>
/// Commands that read logs: every one checks the hash chain first, answers in JSON on request with null for what
/// does not exist, and fails the same way with the same exit code.
/// </summary>
[Collection(InProcessCliCollection.Name)]
public sealed class LogCommandTests
{
    private static async Task<string> ShortRunAsync(string folder, string name = "a.jsonl", string until = "1 d")
    {
        var (exit, _, stderr) = await InProcessTool.RunAsync(folder, "run", "--until", until, "-o", name);
        Assert.True(exit == 4, stderr); // a short run stops at its time limit
        return Path.Combine(folder, name);
    }

    /// <summary>A copy of the log with one event's data changed and its chain left as it was.</summary>
    private static string Forged(string log)
    {
        var lines = File.ReadAllLines(log);
        var index = Array.FindIndex(lines, l => l.Contains("\"probe.telemetry\"", StringComparison.Ordinal));
        lines[index] = lines[index].Replace("\"depth_m\":", "\"depth_m\":9", StringComparison.Ordinal);
        var forged = Path.Combine(Path.GetDirectoryName(log)!, "forged.jsonl");
        File.WriteAllText(forged, string.Join('\n', lines) + "\n");
        return forged;
    }

    [Fact]
    public async Task Events_and_diff_refuse_a_forged_log_like_every_other_command()
    {
        var folder = ToolProcess.NewTempDirectory();
        var log = await ShortRunAsync(folder);
        var forged = Forged(log);

        var events = await InProcessTool.RunAsync(folder, "events", forged, "--kind", "probe.telemetry");
        var diff = await InProcessTool.RunAsync(folder, "diff", log, forged);

        Assert.Equal(6, events.ExitCode); // ExitCode.VerificationFailed
        Assert.Equal(6, diff.ExitCode);
        Assert.Equal("", events.Stdout);
        Assert.DoesNotContain("identical", diff.Stdout, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("verify")]
    [InlineData("events")]
    [InlineData("replay")]
    [InlineData("report")]
    [InlineData("diff")]
    public async Task A_missing_log_is_the_same_failure_with_the_same_code_in_every_command(string command)
    {
        var folder = ToolProcess.NewTempDirectory();
        string[] arguments = command == "diff" ? [command, "nothing.jsonl", "nothing.jsonl"] : [command, "nothing.jsonl"];
        var (exit, _, stderr) = await InProcessTool.RunAsync(folder, arguments);
        Assert.Equal(7, exit); // ExitCode.IoError
        Assert.Contains("no such log", stderr, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("run")]
    [InlineData("check")]
    public async Task A_missing_scenario_is_the_same_failure_in_run_and_check(string command)
    {
        var (exit, _, stderr) = await InProcessTool.RunAsync(ToolProcess.NewTempDirectory(), command, "nosuch.yaml");
        Assert.Equal(7, exit);
        Assert.Contains("no built-in scenario", stderr, StringComparison.Ordinal);
    }

    [Fact]
    public async Task Check_accepts_a_built_in_scenario_by_name()
    {
        var (exit, stdout, _) = await InProcessTool.RunAsync(ToolProcess.NewTempDirectory(), "check", "stall-wall-boost");
        Assert.Equal(0, exit);
        Assert.Contains("2 rules ready", stdout, StringComparison.Ordinal); // the scenario's two rules
    }

    [Fact]
    public async Task Json_answers_have_null_for_what_does_not_exist_never_NaN()
    {
        var folder = ToolProcess.NewTempDirectory();
        var (runExit, runOut, _) = await InProcessTool.RunAsync(folder, "run", "--until", "1 d", "-o", "a.jsonl", "--json");
        var log = Path.Combine(folder, "a.jsonl");
        var verify = await InProcessTool.RunAsync(folder, "verify", log, "--json");
        var diff = await InProcessTool.RunAsync(folder, "diff", log, log, "--json");
        var check = await InProcessTool.RunAsync(folder, "check", "default", "--json");
        var replay = await InProcessTool.RunAsync(folder, "replay", log, "--json", "--kernel", "sequential");

        Assert.Equal(4, runExit);
        foreach (var text in new[] { runOut, verify.Stdout, diff.Stdout, check.Stdout, replay.Stdout })
        {
            Assert.DoesNotContain("NaN", text, StringComparison.Ordinal);
        }

        using var run = JsonDocument.Parse(runOut);
        Assert.Equal(JsonValueKind.Null, run.RootElement.GetProperty("breakthrough_time_s").ValueKind); // not reached in a day
        Assert.Equal(86400, run.RootElement.GetProperty("simulated_time_s").GetDouble());
        Assert.Equal("TimeLimit", run.RootElement.GetProperty("outcome").GetString());
        using var verified = JsonDocument.Parse(verify.Stdout);
        Assert.True(verified.RootElement.GetProperty("intact").GetBoolean());
        Assert.Equal(JsonValueKind.Null, verified.RootElement.GetProperty("first_bad_line").ValueKind);
        using var compared = JsonDocument.Parse(diff.Stdout);
        Assert.True(compared.RootElement.GetProperty("identical").GetBoolean());
        var breakthrough = compared.RootElement.GetProperty("summary").EnumerateArray().Single(f => f.GetProperty("name").GetString() == "breakthrough_t_s");
        Assert.Equal(JsonValueKind.Null, breakthrough.GetProperty("a").ValueKind); // NaN in the log
        using var checkedRules = JsonDocument.Parse(check.Stdout);
        Assert.True(checkedRules.RootElement.GetProperty("ok").GetBoolean());
        using var replayed = JsonDocument.Parse(replay.Stdout);
        Assert.True(replayed.RootElement.GetProperty("identical").GetBoolean());
        Assert.Equal(0, replay.ExitCode);
    }

    [Fact]
    public async Task Events_that_match_nothing_say_what_the_log_holds()
    {
        var folder = ToolProcess.NewTempDirectory();
        var log = await ShortRunAsync(folder);
        var (exit, _, stderr) = await InProcessTool.RunAsync(folder, "events", log, "--kind", "probe.telemetri", "--source", "prob");
        Assert.Equal(0, exit);
        Assert.Contains("its kinds are:", stderr, StringComparison.Ordinal);
        Assert.Contains("probe.telemetry (", stderr, StringComparison.Ordinal);
        Assert.Contains("its sources are:", stderr, StringComparison.Ordinal);
        Assert.Contains("probe (", stderr, StringComparison.Ordinal);
    }

    [Fact]
    public async Task Parse_errors_name_the_option_and_no_dotnet_type()
    {
        var (exit, _, stderr) = await InProcessTool.RunAsync(ToolProcess.NewTempDirectory(), "run", "--seed", "twelve");
        Assert.Equal(2, exit);
        Assert.Contains("--seed", stderr, StringComparison.Ordinal);
        Assert.Contains("whole number", stderr, StringComparison.Ordinal);
        Assert.DoesNotContain("System.", stderr, StringComparison.Ordinal);
    }

    [Fact]
    public async Task Scenarios_are_listed_shown_and_copied_without_replacing_a_file()
    {
        var folder = ToolProcess.NewTempDirectory();
        var list = await InProcessTool.RunAsync(folder, "scenarios", "list");
        var show = await InProcessTool.RunAsync(folder, "scenarios", "show", "tilt-steering");
        var copy = await InProcessTool.RunAsync(folder, "scenarios", "copy", "tilt-steering", "mine.yaml");
        var again = await InProcessTool.RunAsync(folder, "scenarios", "copy", "default", "mine.yaml");

        Assert.Equal(0, list.ExitCode);
        foreach (var name in DescentOps.Scenarios.BuiltInScenarios.Names) Assert.Contains(name[..^".yaml".Length], list.Stdout, StringComparison.Ordinal);
        Assert.Equal(DescentOps.Scenarios.BuiltInScenarios.Text("tilt-steering.yaml"), show.Stdout);
        Assert.Equal(0, copy.ExitCode);
        Assert.Equal(9, again.ExitCode);
        Assert.Equal(DescentOps.Scenarios.BuiltInScenarios.Text("tilt-steering.yaml"), await File.ReadAllTextAsync(Path.Combine(folder, "mine.yaml")));
    }
}
