using DescentOps.Journal;
using DescentOps.Records.Kinds;
using DescentOps.Scenarios;

namespace DescentOps.Mission.Tests.Cli;

/// <summary>
/// Rule tests against a recorded trace: <c>check RULES --trace TRACE.csv [--expect EXPECTED.csv]</c> runs a rule set
/// on the telemetry a run exported, so the set that goes to flight software is tested like code.
/// </summary>
[Collection(InProcessCliCollection.Name)]
public sealed class RuleTraceTests
{
    /// <summary>The scenario's rules block as a rule-set file: the lines under 'rules: |', less their two-space indent.</summary>
    private static string RulesOf(string scenarioText)
    {
        var lines = scenarioText.Replace("\r\n", "\n", StringComparison.Ordinal).Split('\n');
        var start = Array.IndexOf(lines, "rules: |") + 1;
        Assert.True(start > 0);
        return string.Join('\n', lines.Skip(start).TakeWhile(l => l.Length == 0 || l.StartsWith("  ", StringComparison.Ordinal)).Select(l => l.Length >= 2 ? l[2..] : l));
    }

    [Fact]
    public async Task A_trace_test_passes_on_its_own_rules_and_catches_a_changed_threshold()
    {
        var folder = ToolProcess.NewTempDirectory();
        await InProcessTool.RunAsync(folder, "run", "stall-wall-boost.yaml", "--log", "run.jsonl");
        Assert.Equal(0, (await InProcessTool.RunAsync(folder, "export", "run.jsonl", "--format", "csv", "--output", "csv")).ExitCode);
        var rules = RulesOf(BuiltInScenarios.Text("stall-wall-boost.yaml"));
        await File.WriteAllTextAsync(Path.Combine(folder, "rules.dorules"), rules);
        var trace = Path.Combine("csv", "telemetry.csv");

        var (exit, stdout, stderr) = await InProcessTool.RunAsync(folder, "check", "rules.dorules", "--scenario", "stall-wall-boost", "--trace", trace);
        Assert.True(exit == 0, stdout + stderr);
        var rows = stdout.Split('\n', StringSplitOptions.RemoveEmptyEntries).Select(l => l.TrimEnd('\r').Split(',')).ToList();
        Assert.Equal(["t_s", "rule", "kind", "commands"], rows[0]);

        // The scenario's rules run on board and its sensors do not lie, so the trace (the true values logged with each
        // frame) is what the rules saw in the run: on it they fire when and as they fired in the run.
        using (var reader = JournalReader.Open(Path.Combine(folder, "run.jsonl")))
        {
            var fired = reader.ReadAll().OfType<EventEntry>().Where(e => e.Kind == RuleRecords.Fired)
                .Select(e => (e.TimeSeconds, e.Data.Single(f => f.Name == "rule").Text)).ToList();
            Assert.NotEmpty(fired);
            Assert.Equal(fired, rows.Skip(1).Where(r => r[2] == "fired").Select(r => (double.Parse(r[0], System.Globalization.CultureInfo.InvariantCulture), (string?)r[1])));
        }

        await File.WriteAllTextAsync(Path.Combine(folder, "expected.csv"), stdout);
        (exit, stdout, _) = await InProcessTool.RunAsync(folder, "check", "rules.dorules", "--scenario", "stall-wall-boost", "--trace", trace, "--expect", "expected.csv");
        Assert.Equal(0, exit);
        Assert.Contains("as expected; every rule acted", stdout);

        // Someone raises the threshold of the rule that brings the wall back to the boost itself (14 kW; "above" is strict), so
        // it can never fire: the trace test says so.
        Assert.Contains("above 11 kW for 2 h", rules);
        await File.WriteAllTextAsync(Path.Combine(folder, "rules.dorules"), rules.Replace("above 11 kW for 2 h", "above 14 kW for 2 h", StringComparison.Ordinal));
        (exit, stdout, _) = await InProcessTool.RunAsync(folder, "check", "rules.dorules", "--scenario", "stall-wall-boost", "--trace", trace, "--expect", "expected.csv");
        Assert.Equal(8, exit); // ExitCode.RunsDiffer
        Assert.Contains("expected, not done", stdout);
        Assert.Contains("wall-back-to-nominal", stdout);
        Assert.Contains("never acted: wall-back-to-nominal", stdout);
    }

    [Fact]
    public async Task A_trace_without_a_time_column_or_with_a_bad_cell_is_refused_with_its_line()
    {
        var folder = ToolProcess.NewTempDirectory();
        await File.WriteAllTextAsync(Path.Combine(folder, "rules.dorules"), "rule deep { runs on ground severity low when probe.depth above 10 m then { } }\n");
        await File.WriteAllTextAsync(Path.Combine(folder, "no-time.csv"), "probe.depth\n5\n");
        await File.WriteAllTextAsync(Path.Combine(folder, "bad.csv"), "t_s,probe.depth\n0,5\n600,deep\n");

        var (exit, _, stderr) = await InProcessTool.RunAsync(folder, "check", "rules.dorules", "--trace", "no-time.csv");
        Assert.Equal(3, exit);
        Assert.Contains("no 't_s' column", stderr);
        (exit, _, stderr) = await InProcessTool.RunAsync(folder, "check", "rules.dorules", "--trace", "bad.csv");
        Assert.Equal(3, exit);
        Assert.Contains("line 3, column 'probe.depth': 'deep' is not a number", stderr);
    }
}
