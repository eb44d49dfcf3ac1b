using DescentOps.Tests.Shared;

namespace DescentOps.Mission.Tests.Cli;

/// <summary><c>descentops check</c> on a scenario checks its procedures: a clean one passes, a bad goto is a located error.</summary>
[Collection(InProcessCliCollection.Name)]
public sealed class ProcedureCheckCommandTests
{
    [Fact]
    public async Task The_built_in_procedure_scenario_passes_check()
    {
        var (exit, stdout, stderr) = await InProcessTool.RunAsync(ToolProcess.NewTempDirectory(), "check", "ground-frees-stalled-probe.yaml");
        Assert.True(exit == 0, stdout + stderr);
        Assert.Contains(": 0 errors, 0 warnings, 1 rules ready", stdout);
    }

    [Fact]
    public async Task A_goto_to_a_missing_step_fails_check_with_file_line_and_field()
    {
        var folder = ToolProcess.NewTempDirectory();
        string text = TestScenario.BuiltIn("ground-frees-stalled-probe.yaml").Replace("        on_pass: done\n", "        on_pass: finish\n");
        var path = Path.Combine(folder, "bad-goto.yaml");
        await File.WriteAllTextAsync(path, text);
        var line = Array.IndexOf(text.Split('\n'), "        on_pass: finish") + 1;

        var (exit, stdout, _) = await InProcessTool.RunAsync(folder, "check", path);

        Assert.Equal(3, exit);
        Assert.Contains($"{path}:{line}:18: field 'procedures[0].steps[2].on_pass': procedure 'free-frozen-probe' has no step 'finish'", stdout);
    }

    [Fact]
    public async Task A_rule_that_starts_a_missing_procedure_fails_check()
    {
        var folder = ToolProcess.NewTempDirectory();
        var path = Path.Combine(folder, "bad-start.yaml");
        await File.WriteAllTextAsync(path, TestScenario.BuiltIn("ground-frees-stalled-probe.yaml").Replace("{ start free-frozen-probe }", "{ start free-probe }").Text);

        var (exit, stdout, _) = await InProcessTool.RunAsync(folder, "check", path);

        Assert.Equal(3, exit);
        Assert.Contains("UnknownProcedure: unknown procedure 'free-probe'; the mission's procedures are free-frozen-probe", stdout);
    }
}
