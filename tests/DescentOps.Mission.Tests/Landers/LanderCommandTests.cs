using DescentOps.Journal.Comparison;
using DescentOps.Journal.Querying;

namespace DescentOps.Mission.Tests.Landers;

/// <summary>The command line on a log of a run with landers: events by lander, the export's lander column, the report's sections, and branch and replay.</summary>
public sealed class LanderCommandTests
{
    private const string Scenario = "three-landers-shared-link.yaml";

    private static async Task<string> RunAsync(string folder)
    {
        // Exit 4: the run ends at its time limit without completing the mission (README's table).
        var (exit, stdout, stderr) = await InProcessTool.RunAsync(folder, "run", Scenario, "--until", "2 d", "--log", "parent.jsonl");
        Assert.True(exit == 4, stdout + stderr);
        return Path.Combine(folder, "parent.jsonl");
    }

    [Fact]
    public async Task Events_of_one_lander_are_its_components_and_the_shared_link_s_records_about_it()
    {
        var folder = ToolProcess.NewTempDirectory();
        var log = await RunAsync(folder);

        var fell = JournalQuery.Events(log, new EventFilter([], []) { Landers = ["fell"] }).Select(e => e.Event).ToList();
        Assert.NotEmpty(fell);
        Assert.All(fell, e => Assert.Equal("fell", EventFilter.LanderOf(e)));
        Assert.Contains(fell, e => e.Source == "fell/probe");
        Assert.Contains(fell, e => e.Source == "link-home");
        Assert.DoesNotContain(fell, e => e.Source.StartsWith("tarn/", StringComparison.Ordinal));

        var (exit, _, stderr) = await InProcessTool.RunAsync(folder, "events", "parent.jsonl", "--lander", "nowhere");
        Assert.Equal(0, exit);
        Assert.Contains("its landers are: brack", stderr);
    }

    [Fact]
    public async Task The_export_names_each_event_s_lander_and_the_report_has_a_section_per_lander_and_the_shared_link()
    {
        var folder = ToolProcess.NewTempDirectory();
        await RunAsync(folder);

        Assert.Equal(0, (await InProcessTool.RunAsync(folder, "export", "parent.jsonl", "--format", "csv")).ExitCode);
        var rows = File.ReadLines(Path.Combine(folder, "parent-csv", "events.csv")).ToList();
        Assert.StartsWith("seq,t_s,source,lander,", rows[0]);
        Assert.Contains(rows, r => r.Contains(",brack/station,brack,station.failed,", StringComparison.Ordinal));
        Assert.Contains(rows, r => r.Contains(",link-home,,link.started,", StringComparison.Ordinal));

        Assert.Equal(0, (await InProcessTool.RunAsync(folder, "report", "parent.jsonl")).ExitCode);
        var html = await File.ReadAllTextAsync(Path.Combine(folder, "parent.html"));
        foreach (var id in new[] { "lander-tarn", "lander-brack", "lander-fell", "shared-link", "plot-link-channels", "plot-link-waiting" })
        {
            Assert.Contains($"id=\"{id}\"", html);
        }

        Assert.Contains("its station failed", html);
    }

    [Fact]
    public async Task A_branch_adds_a_fault_to_the_lander_it_names_and_replays()
    {
        var folder = ToolProcess.NewTempDirectory();
        await RunAsync(folder);
        await File.WriteAllTextAsync(Path.Combine(folder, "change.yaml"), """
            add_faults:
              - name: cairn-dies
                lander: tarn
                kind: station_failure
                at: 40 h
            """);
        await File.WriteAllTextAsync(Path.Combine(folder, "unnamed.yaml"), """
            add_faults:
              - name: cairn-dies
                kind: station_failure
                at: 40 h
            """);

        var (exit, stdout, stderr) = await InProcessTool.RunAsync(folder, "branch", "parent.jsonl", "--at", "39 h", "--with", "change.yaml", "--log", "branch.jsonl");
        Assert.True(exit == 0, stdout + stderr);
        var divergence = Assert.IsType<JournalDivergence>(JournalDiff.Compare(Path.Combine(folder, "parent.jsonl"), Path.Combine(folder, "branch.jsonl")).FirstEventDivergence);
        Assert.Equal(40 * 3600.0, divergence.TimeB);
        Assert.Contains("tarn/fault-injector fault.injected", divergence.LineB);
        Assert.Equal(0, (await InProcessTool.RunAsync(folder, "replay", "branch.jsonl")).ExitCode);

        // With three landers a fault that names none is refused, at its place in the change file.
        var refused = await InProcessTool.RunAsync(folder, "branch", "parent.jsonl", "--at", "39 h", "--with", "unnamed.yaml", "--log", "unnamed.jsonl");
        Assert.NotEqual(0, refused.ExitCode);
        Assert.Contains("add_faults[0].lander", refused.Stderr);
        Assert.False(File.Exists(Path.Combine(folder, "unnamed.jsonl")));
    }
}
