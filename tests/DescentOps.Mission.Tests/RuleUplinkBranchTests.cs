using DescentOps.Journal;
using DescentOps.Primitives.Time;
using DescentOps.Records.Kinds;

namespace DescentOps.Mission.Tests;

/// <summary>
/// A branch that uplinks a rule set and sends a telecommand at an instant: identical to its parent before it, the
/// ground's new rules act from the instant, the probe loads its part one uplink later.
/// </summary>
[Collection(Cli.InProcessCliCollection.Name)]
public sealed class RuleUplinkBranchTests
{
    private const double AtS = 40 * 86400.0;

    // The parent's on-board boost stays; a ground rule that trims the wall heater is new, and so is the head command.
    private const string Change = """
        description: At day 40 the team uplinks a set that trims the wall heaters from the ground.
        uplink_rules:
          - at: 40 d
            rules: |
              autonomy E3
              rule frozen-in-boost-wall {
                runs on board
                severity high
                priority 5
                when probe.regime is FrozenIn
                then { send probe.wall set_power(power = 14 kW) }
              }
              rule trim-wall {
                runs on ground
                severity low
                when probe.wall_power above 9 kW and probe.regime is Melting
                then { send probe.wall set_power(power = 8 kW) }
              }
        add_telecommands:
          - { at: 41 d, from: ground, send: "probe.head set_power(power = 5 kW)" }
        """;

    private static List<EventEntry> Events(string path)
    {
        using var reader = JournalReader.Open(path);
        return [.. reader.ReadAll().OfType<EventEntry>()];
    }

    private static string Text(EventEntry e, string name) => e.Data.Single(f => f.Name == name).Text ?? "";

    private static double Number(EventEntry e, string name) => e.Data.Single(f => f.Name == name).Number;

    [Fact]
    public async Task A_branch_with_an_uplink_at_T_equals_its_parent_before_T()
    {
        var folder = await BranchFolder.WithParentAsync();
        var (exit, stdout, stderr) = await folder.BranchAsync(Change, "40 d");
        Assert.True(exit == 0, stdout + stderr);

        // The two logs part at the uplink itself, day 40, and not a line before.
        Assert.Contains(RuleRecords.SetUplinked, folder.PartingAt(AtS).LineB);

        var branch = Events(folder.File("branch.jsonl"));
        var parent = Events(folder.ParentLog);
        Assert.Equal(parent.TakeWhile(e => e.TimeSeconds < AtS).Select(e => (e.Kind, e.TimeSeconds)), branch.TakeWhile(e => e.TimeSeconds < AtS).Select(e => (e.Kind, e.TimeSeconds)));

        // On board, the set is loaded one uplink later: light time, the station's 2 s, the fibre paid out by then
        // (the scenario's 1.08e9 km, c = 299,792,458 m/s, 2.04e8 m/s in the fibre; each leg in whole ticks).
        var loaded = Assert.Single(branch, e => e.Kind == RuleRecords.SetLoaded);
        var light = SimDuration.FromSeconds(1.08e12 / 299_792_458.0);
        var atSurfaceEnd = SimTime.FromSecondsSinceEpoch(AtS) + light + SimDuration.FromSeconds(2);
        var paidOutM = branch.Where(e => e.Kind == ProbeRecords.Telemetry && e.TimeSeconds <= atSurfaceEnd.SecondsSinceEpoch).Max(e => Number(e, "depth_m"));
        var expected = SimTime.FromSecondsSinceEpoch(AtS) + light + SimDuration.FromSeconds(2) + SimDuration.FromSeconds(paidOutM / 2.04e8);
        Assert.Equal(expected.SecondsSinceEpoch, loaded.TimeSeconds);
        Assert.Equal(1, loaded.Data.Single(f => f.Name == "rules").Integer);

        // The ground's new rule acts after the instant; the parent never had it.
        var trims = branch.Where(e => e.Kind == RuleRecords.Fired && Text(e, "rule") == "trim-wall").ToList();
        Assert.NotEmpty(trims);
        Assert.All(trims, t => Assert.True(t.TimeSeconds >= AtS));
        Assert.DoesNotContain(parent, e => e.Kind == RuleRecords.Fired && Text(e, "rule") == "trim-wall");
        var sent = Assert.Single(branch, e => e.Kind == CommandRecords.Sent);
        Assert.Equal(41 * 86400.0, sent.TimeSeconds);

        Assert.Equal(0, (await folder.ToolAsync("replay", "branch.jsonl")).ExitCode);
    }

    [Fact]
    public async Task An_uplink_before_the_branch_instant_is_refused_before_anything_runs()
    {
        var folder = ToolProcess.NewTempDirectory();
        await InProcessTool.RunAsync(folder, "run", "default", "--until", "2 d", "--log", "parent.jsonl");
        Assert.True(File.Exists(Path.Combine(folder, "parent.jsonl")));
        await File.WriteAllTextAsync(Path.Combine(folder, "change.yaml"), Change);
        var (exit, _, stderr) = await InProcessTool.RunAsync(folder, "branch", "parent.jsonl", "--at", "45 d", "--with", "change.yaml", "--log", "branch.jsonl");
        Assert.NotEqual(0, exit);
        Assert.Contains("before the branch instant", stderr);
        Assert.Empty(Directory.GetFiles(folder, "branch.jsonl*"));
    }
}
