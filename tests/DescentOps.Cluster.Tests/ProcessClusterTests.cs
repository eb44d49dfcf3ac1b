using System.Text.RegularExpressions;
using Xunit;

namespace DescentOps.Cluster.Tests;

/// <summary>
/// The campaign node and its workers as separate processes on loopback: one worker is killed (SIGKILL, by its process
/// id) in the middle of the campaign, another is stopped with SIGTERM (Ctrl-C's path), and the campaign still ends with
/// exactly the local campaign's summary and tables.
/// </summary>
public sealed class ProcessClusterTests
{
    [Fact]
    public async Task A_killed_workers_runs_are_redone_and_the_campaign_equals_the_local_one()
    {
        var local = ClusterFixture.TempDir();
        var clustered = ClusterFixture.TempDir();
        // The doomed worker is killed while it holds runs (the node's --verbose log on stderr names each assignment), so the campaign
        // cannot end before the cluster downs it and its runs go to others: no race with the failure detector, whatever
        // the machine's load. 36 runs leave work for the other two after the kill.
        var common = new[] { "campaign", ClusterFixture.Scenario, "--runs", "36", "--seed", "17" };
        var (exit, _, stderr) = await ClusterFixture.CliAsync([.. common, "--jobs", "2", "--output", local]);
        Assert.True(exit == 0, stderr);

        var port = ClusterFixture.FreePort();
        var join = $"127.0.0.1:{port}";
        var patient = ClusterFixture.PatientAkkaFile(); // a starved heartbeat must not down a live member; the killed one is still found lost
        using var node = new ToolProcess(clustered, [.. common, "--cluster", "--akka-config", patient, "--listen", join, "--jobs", "1", "--output", clustered, "--verbose"]); // its log is shown only if the test fails
        using var doomed = new ToolProcess(clustered, "worker", "--join", join, "--jobs", "2", "--akka-config", patient); // two slots: it asks for the next run as soon as one ends
        using var stopping = new ToolProcess(clustered, "worker", "--join", join, "--jobs", "1", "--akka-config", patient);

        // Both workers joined (the node's own slot joins with 1 slot too); the doomed one (the only one with two slots) is handed a run; it is killed then.
        var doomedId = "";
        await ClusterFixture.Until(() => node.HasExited || (Regex.Match(node.Stdout, @"worker (w\d+) \([^)]*\) joined with 2 slot\(s\)") is { Success: true } m && (doomedId = m.Groups[1].Value).Length > 0 && Regex.Count(node.Stdout, @"joined with 1 slot\(s\)") >= 2 && node.Stderr.Contains($"assigned to worker {doomedId}", StringComparison.Ordinal)), "both workers joined and the doomed one holds a run");
        Assert.False(node.HasExited, node.Stdout + node.Stderr);
        doomed.KillHard();
        var atKill = ClusterFixture.StoredRuns(clustered);
        await ClusterFixture.Until(() => node.HasExited || ClusterFixture.StoredRuns(clustered) >= atKill + 2, "2 more runs stored");
        await stopping.SignalAsync("TERM");
        await stopping.WaitAsync(ClusterFixture.Guard);
        await node.WaitAsync(ClusterFixture.Guard);

        Assert.True(node.ExitCode == 0, node.Stdout + node.Stderr);
        Assert.Equal(File.ReadAllText(Path.Combine(local, "summary.json")), File.ReadAllText(Path.Combine(clustered, "summary.json")));
        Assert.Equal(ClusterFixture.Dump(local), ClusterFixture.Dump(clustered));

        // The node saw the killed worker lost (after the cluster downed it) and the stopped one leave. (A worker that a
        // loaded machine made look unreachable rejoins under a new number, hence any number for the one that left.)
        Assert.True(Regex.IsMatch(node.Stdout, $@"worker {doomedId} lost"), node.Stdout);
        Assert.True(Regex.IsMatch(node.Stdout, @"worker w\d+ left"), node.Stdout);
        Assert.True(stopping.ExitCode == 0, stopping.Stdout + stopping.Stderr);
        Assert.Contains("worker stopped:", stopping.Stdout, StringComparison.Ordinal);
    }

    [Fact]
    public async Task A_campaign_node_killed_and_resumed_carries_on_with_the_worker_that_rejoins()
    {
        var local = ClusterFixture.TempDir();
        var clustered = ClusterFixture.TempDir();
        var common = new[] { "campaign", ClusterFixture.Scenario, "--runs", "24", "--seed", "29" };
        var (exit, _, stderr) = await ClusterFixture.CliAsync([.. common, "--jobs", "2", "--output", local]);
        Assert.True(exit == 0, stderr);

        var port = ClusterFixture.FreePort();
        var join = $"127.0.0.1:{port}";
        using var worker = new ToolProcess(clustered, "worker", "--join", join, "--jobs", "1");
        string firstOutput;
        using (var first = new ToolProcess(clustered, [.. common, "--cluster", "--listen", join, "--jobs", "0", "--output", clustered]))
        {
            await ClusterFixture.Until(() => first.HasExited || ClusterFixture.StoredRuns(clustered) >= 5, "5 runs stored");
            Assert.False(first.HasExited, first.Stdout + first.Stderr);
            first.KillHard();
            await first.WaitAsync(ClusterFixture.Guard);
            firstOutput = first.Stdout;
        }

        var stored = ClusterFixture.StoredRuns(clustered);
        Assert.InRange(stored, 5, 23);
        using var resumed = new ToolProcess(clustered, [.. common, "--cluster", "--listen", join, "--jobs", "0", "--output", clustered, "--resume"]);
        await resumed.WaitAsync(ClusterFixture.Guard);
        Assert.True(resumed.ExitCode == 0, firstOutput + resumed.Stdout + resumed.Stderr);
        Assert.Contains($"{stored} run(s) already stored", resumed.Stdout, StringComparison.Ordinal);
        Assert.Contains("joined with 1 slot(s)", resumed.Stdout, StringComparison.Ordinal); // the same worker process, rejoined
        Assert.Equal(File.ReadAllText(Path.Combine(local, "summary.json")), File.ReadAllText(Path.Combine(clustered, "summary.json")));
        Assert.Equal(ClusterFixture.Dump(local), ClusterFixture.Dump(clustered));

        await worker.SignalAsync("INT");
        await worker.WaitAsync(ClusterFixture.Guard);
        Assert.True(worker.ExitCode == 0, worker.Stdout + worker.Stderr);
        Assert.Contains("the campaign node is gone", worker.Stdout, StringComparison.Ordinal);
    }
}
