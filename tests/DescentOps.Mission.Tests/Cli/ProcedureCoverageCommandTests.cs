namespace DescentOps.Mission.Tests.Cli;

/// <summary>
/// Coverage from a trace (<c>check RULES --scenario S --trace T</c>, on standard error beside the rows) and from a run's
/// log (<c>check S --coverage LOG</c>): which rules acted and which procedure branches were taken.
/// </summary>
[Collection(InProcessCliCollection.Name)]
public sealed class ProcedureCoverageCommandTests
{
    private const string GroundRule = """
        autonomy E1
        rule frozen-in-seen {
          runs on ground
          severity high
          when probe.regime is FrozenIn
          then { start free-frozen-probe }
        }
        """;

    [Fact]
    public async Task A_trace_runs_the_scenarios_procedures_and_a_run_log_reports_the_same_branches()
    {
        var folder = ToolProcess.NewTempDirectory();
        Assert.Equal(4, (await InProcessTool.RunAsync(folder, "run", "ground-frees-stalled-probe.yaml", "--until", "2 d", "--log", "run.jsonl")).ExitCode); // time limit
        Assert.Equal(0, (await InProcessTool.RunAsync(folder, "export", "run.jsonl", "--format", "csv", "--output", "csv")).ExitCode);
        await File.WriteAllTextAsync(Path.Combine(folder, "ground.dorules"), GroundRule);

        var (exit, stdout, stderr) = await InProcessTool.RunAsync(folder, "check", "ground.dorules", "--scenario", "ground-frees-stalled-probe.yaml", "--trace", Path.Combine("csv", "telemetry.csv"));
        Assert.True(exit == 0, stdout + stderr);
        // On the trace there is no link: the procedure starts on the frozen row itself, and each step ends on the row that shows it.
        Assert.Contains("87000,frozen-in-seen,fired,procedure start(name=free-frozen-probe)", stdout);
        Assert.Contains("87000,procedure free-frozen-probe,step boost-wall started,probe.wall set_power(power=14000)", stdout);
        Assert.Contains("94800,procedure free-frozen-probe,step boost-wall passed,", stdout);
        Assert.Contains("103200,procedure free-frozen-probe,done,", stdout);
        const string Branches = "procedure free-frozen-probe: 3 of 8 branches taken; never: boost-wall late, await-melting late, wall-to-nominal failed, wall-to-nominal late, safe-mode passed";
        Assert.Contains("coverage: 1 of 1 rules acted; every rule acted", stderr);
        Assert.Contains("coverage: " + Branches, stderr);

        (exit, stdout, _) = await InProcessTool.RunAsync(folder, "check", "ground-frees-stalled-probe.yaml", "--coverage", "run.jsonl");
        Assert.Equal(0, exit);
        Assert.Contains("run.jsonl: 1 of 1 rules acted", stdout);
        Assert.Contains(Branches, stdout);
    }
}
