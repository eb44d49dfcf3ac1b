using System.Security.Cryptography;
using DescentOps.Cli.Running;

namespace DescentOps.Mission.Tests;

/// <summary>Branches: identical to the parent before the instant, different where the change acts, and honest about it.</summary>
public sealed class BranchTests
{
    private const string SecondTrip = """
        add_faults:
          - name: second-trip-day-50
            kind: power_dip
            at: 50 d
            duration: 3 h
            remaining_fraction: 0
        """;

    [Fact]
    public async Task A_branch_equals_its_parent_before_the_instant_and_parts_where_the_change_acts()
    {
        var folder = await BranchFolder.WithParentAsync();
        var (exit, stdout, stderr) = await folder.BranchAsync(SecondTrip, "50 d");
        Assert.True(exit == 0, stdout + stderr);

        // The added fault starts at day 50 = 4,320,000 s: that is where the two logs part, and not a line before.
        Assert.Contains("second-trip-day-50", folder.PartingAt(50 * 86400.0).LineB);

        var logged = LoggedRun.Open(folder.File("branch.jsonl"));
        var info = Assert.IsType<BranchInfo>(BranchInfo.Of(logged.Manifest));
        Assert.Equal(Convert.ToHexStringLower(SHA256.HashData(await File.ReadAllBytesAsync(folder.ParentLog))), info.ParentSha256);
        Assert.Equal(50 * 86400.0, info.AtS);
        Assert.Equal(0, (await folder.ToolAsync("replay", "branch.jsonl")).ExitCode);
    }

    [Fact]
    public async Task A_change_that_acts_before_the_instant_is_refused_and_leaves_no_log()
    {
        var folder = await BranchFolder.WithParentAsync();
        // The parent's trip is on day 20; removing it changes the run from day 20, before a day-30 instant.
        var (exit, _, stderr) = await folder.BranchAsync("remove_faults:\n  - name: bus-trip-day-20\n", "30 d");
        Assert.Equal(3, exit); // ExitCode.InvalidInput
        Assert.Contains("acts before the branch instant", stderr);
        Assert.Empty(Directory.GetFiles(folder.Path, "branch.jsonl*"));
    }

    [Fact]
    public async Task A_branch_of_a_branch_carries_both_changes_and_replays()
    {
        var folder = await BranchFolder.WithParentAsync();
        Assert.Equal(0, (await folder.BranchAsync(SecondTrip, "50 d", log: "b1.jsonl", changeFile: "first.yaml")).ExitCode);
        var third = SecondTrip.Replace("second-trip-day-50", "third-trip-day-70", StringComparison.Ordinal).Replace("at: 50 d", "at: 70 d", StringComparison.Ordinal);
        var (exit, stdout, stderr) = await folder.BranchAsync(third, "70 d", log: "b2.jsonl", from: "b1.jsonl", changeFile: "second.yaml");
        Assert.True(exit == 0, stdout + stderr);

        var generations = BranchInfo.All(LoggedRun.Open(folder.File("b2.jsonl")).Manifest);
        Assert.Equal([50 * 86400.0, 70 * 86400.0], generations.Select(g => g.AtS));
        // Replay re-applies both changes in order; with only the last one it would part on day 50.
        Assert.Equal(0, (await folder.ToolAsync("replay", "b2.jsonl")).ExitCode);
    }

    [Fact]
    public async Task A_branch_never_overwrites_an_existing_log_not_even_its_parent()
    {
        var folder = await BranchFolder.WithParentAsync();
        var before = await File.ReadAllBytesAsync(folder.ParentLog);

        var (exit, _, stderr) = await folder.BranchAsync(SecondTrip, "50 d", log: "parent.jsonl");
        Assert.Equal(9, exit); // ExitCode.OutputRefused, as for every command's refused output
        Assert.Contains("input", stderr);
        Assert.Equal(before, await File.ReadAllBytesAsync(folder.ParentLog));
    }
}
