using System.Text.RegularExpressions;
using DescentOps.Journal;
using DescentOps.Records.Kinds;
using DescentOps.Tests.Shared;

namespace DescentOps.Mission.Tests.Cli;

/// <summary>
/// The README's change file with a time-tagged telecommand and a rule uplink, run as written on a branch of the
/// scenario it names (power-dip-load-shedding, whose probe has a power bus with a sampling-pump load) at day 40.
/// </summary>
[Collection(InProcessCliCollection.Name)]
public sealed partial class ReadmeBranchExampleTests
{
    [GeneratedRegex(@"^```yaml\n(?<body># scenario: power-dip-load-shedding\.yaml\n.*?)^```", RegexOptions.Multiline | RegexOptions.Singleline)]
    private static partial Regex ChangeBlock();

    private static string ReadmeChange() => ChangeBlock().Match(RepositoryRoot.Text("README.md")).Groups["body"].Value;

    private static List<EventEntry> Events(string path)
    {
        using var reader = JournalReader.Open(path);
        return [.. reader.ReadAll().OfType<EventEntry>()];
    }

    private static string Text(EventEntry e, string name) => e.Data.Single(f => f.Name == name).Text ?? "";

    [Fact]
    public async Task The_readme_change_file_sheds_the_pump_and_its_uplinked_rule_sees_the_load_off()
    {
        var change = ReadmeChange();
        Assert.Contains("add_telecommands:", change);
        var folder = ToolProcess.NewTempDirectory();
        await File.WriteAllTextAsync(Path.Combine(folder, "change.yaml"), change);
        // The parent stops at the 41 d limit before breakthrough: exit 4, as the README's table of exit codes says; the branch reports the comparison (0).
        Assert.Equal(4, (await InProcessTool.RunAsync(folder, "run", "power-dip-load-shedding.yaml", "--until", "41 d", "--log", "parent.jsonl")).ExitCode);

        var (exit, stdout, stderr) = await InProcessTool.RunAsync(folder, "branch", "parent.jsonl", "--at", "40 d", "--with", "change.yaml", "--log", "branch.jsonl");
        Assert.True(exit == 0, stdout + stderr);

        var branch = Events(Path.Combine(folder, "branch.jsonl")).Where(e => e.TimeSeconds >= 40 * 86400.0).ToList();
        var sent = Assert.Single(branch, e => e.Kind == CommandRecords.Sent);
        Assert.Equal((3_481_920.0, "add_telecommands[0]"), (sent.TimeSeconds, Text(sent, "origin"))); // 40.3 d × 86,400 s
        var shed = Assert.Single(branch, e => e.Kind == ProbeRecords.LoadShed && Text(e, "load") == "sampling-pump");
        Assert.Equal("command", Text(shed, "cause"));
        Assert.True(shed.TimeSeconds > sent.TimeSeconds + 3600, "a ground command lands one uplink (over an hour of light time) after it leaves");

        // The uplinked ground rule reads the load's state point: it acts on the first frame sampled after the shed.
        var fired = Assert.Single(branch, e => e.Kind == RuleRecords.Fired && Text(e, "rule") == "trim-wall-after-shed");
        var firstFrameAfter = branch.First(e => e.Kind == ProbeRecords.Telemetry && e.TimeSeconds >= shed.TimeSeconds).TimeSeconds;
        Assert.StartsWith($"probe.load.sampling-pump=off@{firstFrameAfter}s", Text(fired, "evidence"), StringComparison.Ordinal);

        // The new ground rules start in the frames' time: frames sampled before the uplink and still on their way are taken.
        Assert.DoesNotContain(branch, e => e.Kind == RuleRecords.SampleRejected);
    }
}
