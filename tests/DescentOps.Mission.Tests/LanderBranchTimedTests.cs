using DescentOps.Journal;
using DescentOps.Records.Kinds;

namespace DescentOps.Mission.Tests;

/// <summary>
/// A branch of the three-lander scenario that uplinks a rule set to one lander and sends a telecommand to another: equal
/// to its parent before the instant, and each addition acts on the lander it names only. Without a lander, refused.
/// </summary>
[Collection(Cli.InProcessCliCollection.Name)]
public sealed class LanderBranchTimedTests
{
    private const double AtS = 36 * 3600.0;

    private const string Change = """
        description: At 36 h the team uplinks a wall trim to Tarn Flats and at 37 h lowers Quillet's head power.
        uplink_rules:
          - at: 36 h
            lander: tarn
            rules: |
              rule tarn-trim {
                runs on ground
                severity low
                when probe.wall_power above 9 kW and probe.regime is Melting
                then { send probe.wall set_power(power = 8 kW) }
              }
        add_telecommands:
          - { at: 37 h, from: ground, lander: fell, send: "probe.head set_power(power = 5 kW)" }
        """;

    private static List<EventEntry> Events(string path)
    {
        using var reader = JournalReader.Open(path);
        return [.. reader.ReadAll().OfType<EventEntry>()];
    }

    private static string Text(EventEntry e, string name) => e.Data.Single(f => f.Name == name).Text ?? "";

    [Fact]
    public async Task A_lander_branch_with_an_uplink_and_a_telecommand_at_T_equals_its_parent_before_T()
    {
        var folder = ToolProcess.NewTempDirectory();
        Assert.Equal(4, (await InProcessTool.RunAsync(folder, "run", "three-landers-shared-link", "--until", "3 d", "--log", "parent.jsonl")).ExitCode); // 4: the time limit
        await File.WriteAllTextAsync(Path.Combine(folder, "change.yaml"), Change);
        var (exit, stdout, stderr) = await InProcessTool.RunAsync(folder, "branch", "parent.jsonl", "--at", "36 h", "--with", "change.yaml", "--log", "branch.jsonl");
        Assert.True(exit == 0, stdout + stderr);

        var parent = Events(Path.Combine(folder, "parent.jsonl"));
        var branch = Events(Path.Combine(folder, "branch.jsonl"));
        var before = parent.TakeWhile(e => e.TimeSeconds < AtS).ToList();
        Assert.NotEmpty(before);
        Assert.Equal(before.Select(e => (e.Sequence, e.Kind, e.Source, e.TimeSeconds)), branch.TakeWhile(e => e.TimeSeconds < AtS).Select(e => (e.Sequence, e.Kind, e.Source, e.TimeSeconds)));

        // The uplink reaches Tarn Flats' ground (at T) and board only; its rule fires on Tarn Flats alone, after T.
        var uplinked = Assert.Single(branch, e => e.Kind == RuleRecords.SetUplinked);
        Assert.Equal(("tarn/ground", AtS), (uplinked.Source, uplinked.TimeSeconds));
        Assert.Equal("tarn/autonomy", Assert.Single(branch, e => e.Kind == RuleRecords.SetLoaded).Source);
        var trims = branch.Where(e => e.Kind == RuleRecords.Fired && Text(e, "rule") == "tarn-trim").ToList();
        Assert.NotEmpty(trims);
        Assert.All(trims, t => Assert.Equal("tarn/ground", t.Source));
        Assert.All(trims, t => Assert.True(t.TimeSeconds >= AtS));

        // The telecommand leaves Fellside Rise's ground at its time and is carried out by Fellside's probe only.
        var sent = Assert.Single(branch, e => e.Kind == CommandRecords.Sent && Text(e, "origin") == "add_telecommands[0]");
        Assert.Equal(("fell/ground", 37 * 3600.0), (sent.Source, sent.TimeSeconds));
        var executed = branch.Where(e => e.Kind == CommandRecords.Executed && Text(e, "origin") == "add_telecommands[0]").ToList();
        Assert.All(executed, e => Assert.Equal("fell/probe", e.Source));
        Assert.DoesNotContain(parent, e => e.Kind == RuleRecords.SetUplinked || (e.Kind == CommandRecords.Sent && Text(e, "origin") == "add_telecommands[0]"));

        var replay = await InProcessTool.RunAsync(folder, "replay", "branch.jsonl");
        Assert.True(replay.ExitCode is 0 or 4, replay.Stdout + replay.Stderr);
        Assert.Contains("identical", replay.Stdout, StringComparison.OrdinalIgnoreCase);
    }

    [Theory]
    [InlineData("add_telecommands:\n  - { at: 37 h, from: ground, send: \"probe.head set_power(power = 5 kW)\" }\n", "add_telecommands[0].lander", "names its lander")]
    [InlineData("add_telecommands:\n  - { at: 37 h, from: ground, lander: nowhere, send: \"probe.head set_power(power = 5 kW)\" }\n", "add_telecommands[0].lander", "no lander named 'nowhere'")]
    [InlineData("uplink_rules:\n  - at: 36 h\n    rules: |\n      rule r { runs on ground when probe.regime is Melting then { send probe.wall set_power(power = 8 kW) } }\n", "uplink_rules[0].lander", "names its lander")]
    public async Task A_timed_addition_that_names_no_lander_of_several_is_refused_at_its_entry(string change, string field, string message)
    {
        var folder = ToolProcess.NewTempDirectory();
        Assert.Equal(4, (await InProcessTool.RunAsync(folder, "run", "three-landers-shared-link", "--until", "2 d", "--log", "parent.jsonl")).ExitCode); // 4: the time limit
        await File.WriteAllTextAsync(Path.Combine(folder, "change.yaml"), "description: a change\n" + change);
        var (exit, _, stderr) = await InProcessTool.RunAsync(folder, "branch", "parent.jsonl", "--at", "36 h", "--with", "change.yaml", "--log", "branch.jsonl");
        Assert.NotEqual(0, exit);
        Assert.Contains(field, stderr, StringComparison.Ordinal);
        Assert.Contains(message, stderr, StringComparison.Ordinal);
        Assert.Contains("change.yaml:3:", stderr, StringComparison.Ordinal); // the entry's line, not the file's start
        Assert.Empty(Directory.GetFiles(folder, "branch.jsonl*"));
    }
}
