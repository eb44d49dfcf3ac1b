using DescentOps.Records;
using DescentOps.Records.Kinds;
using DescentOps.Scenarios.Loading;
using DescentOps.Tests.Shared;

namespace DescentOps.Mission.Tests.Landers;

/// <summary>
/// A scenario's mission rules (the <c>mission_rules</c> section): ground rules across landers, run at the mission desk
/// on every lander's frames as they arrive through the shared link, checked against every lander's qualified points.
/// </summary>
[Collection(Cli.InProcessCliCollection.Name)]
public sealed class MissionRulesTests
{
    private const string Name = "three-landers-shared-link.yaml";
    private const double Hour = 3600;

    /// <summary>Tarn Flats' probe more than 5 m deeper than Fellside Rise's (whose bus sags to a fifth at 26 h): more head power to Fellside.</summary>
    private const string Comparing = """
        mission_rules: |
          rule fell-falls-behind {
            runs on ground
            severity high
            when tarn/probe.depth minus fell/probe.depth above 5 m
            then { send fell/probe.head set_power(power = 6 kW) }
          }
        """;

    private static string Lander(JournalRecord r) => CollectingSink.TextField(r, "lander");

    [Fact]
    public async Task A_mission_rules_section_of_comments_alone_runs_without_a_desk()
    {
        // It parses to no rule, so there is no mission desk; before, the shared link still sent it every frame and the
        // run stopped on "sent LanderFrame to unknown component".
        var loaded = TestScenario.BuiltIn(Name).AddSection("mission_rules: |\n  # the mission's own rules come later\n").Load();
        var (summary, sink) = await MissionHarness.RunAsync(loaded with { Run = loaded.Run with { UntilS = 6 * Hour } });

        Assert.Equal(0, summary.ComponentFailures);
        Assert.NotEmpty(sink.OfKind(GroundRecords.Telemetry));
        Assert.DoesNotContain(sink.Records, r => r.Source.Name == "mission-desk");
    }

    [Fact]
    public async Task A_comparing_rule_fires_when_the_frame_that_makes_the_difference_reaches_the_ground_and_its_command_goes_to_the_named_lander()
    {
        var loaded = TestScenario.BuiltIn(Name).AddSection(Comparing).Load();
        var (_, sink) = await MissionHarness.RunAsync(loaded with { Run = loaded.Run with { UntilS = 2 * 24 * Hour } });

        // The expected instant from the log alone: walk the frames in the order they reached the ground (each lander's
        // ground desk logs its arrival with the frame's depth reading), keep each lander's latest, and take the first
        // arrival at which Tarn's latest depth exceeds Fellside's latest by more than 5 m.
        var latest = new Dictionary<string, double>(StringComparer.Ordinal);
        JournalRecord? deciding = null;
        foreach (var arrival in sink.OfKind(GroundRecords.Telemetry).Where(r => Lander(r) is "tarn" or "fell"))
        {
            latest[Lander(arrival)] = CollectingSink.Field(arrival, "depth_m");
            if (latest.TryGetValue("tarn", out var tarn) && latest.TryGetValue("fell", out var fell) && tarn - fell > 5)
            {
                deciding = arrival;
                break;
            }
        }

        Assert.NotNull(deciding);
        var fired = sink.Records.First(r => r.Source == MissionIds.MissionDesk && r.Kind == RuleRecords.Fired);
        Assert.Equal(deciding.Time, fired.Time);
        Assert.Equal("fell-falls-behind", CollectingSink.TextField(fired, "rule"));
        Assert.Equal("fell/probe.head set_power(power=6000)", CollectingSink.TextField(fired, "commands"));
        // The evidence is each lander's latest frame the ground holds, stamped with its arrival.
        Assert.StartsWith($"tarn/probe.depth={latest["tarn"]:R}@", CollectingSink.TextField(fired, "evidence"));
        Assert.Contains($"fell/probe.depth={latest["fell"]:R}@", CollectingSink.TextField(fired, "evidence"));

        // The command joins Fellside's queue on the shared link, goes up in Fellside's turn and is executed by Fellside's probe alone.
        var up = sink.OfKind(LinkRecords.CommandSent).First(r => CollectingSink.TextField(r, "origin") == "fell-falls-behind");
        Assert.Equal("fell", Lander(up));
        Assert.Equal(up.Time.SecondsSinceEpoch - fired.Time.SecondsSinceEpoch, CollectingSink.Field(up, "held_s"), 6);
        var executed = sink.OfKind(CommandRecords.Executed).Where(r => CollectingSink.TextField(r, "origin") == "fell-falls-behind").ToList();
        Assert.NotEmpty(executed);
        Assert.All(executed, r => Assert.Equal("fell/probe", r.Source.Name));
        var light = CollectingSink.Field(sink.OfKind(LinkRecords.Started).Single(), "one_way_light_time_s");
        Assert.True(executed[0].Time.SecondsSinceEpoch >= up.Time.SecondsSinceEpoch + light, "a command reaches the probe no sooner than a light time after it goes up");
    }

    [Fact]
    public async Task Check_refuses_unknown_landers_unknown_points_mismatched_units_and_rules_on_board_at_their_lines_in_the_field()
    {
        var scenario = TestScenario.BuiltIn(Name).AddSection("""
            mission_rules: |
              rule a {
                runs on ground
                severity high
                when moor/probe.depth above 5 m
                then { send fell/probe.head set_power(power = 6 kW) }
              }
              rule b {
                runs on ground
                severity high
                priority 1
                when tarn/probe.depth minus fell/probe.head_power above 5 m
                then { send fell/probe.head set_power(power = 6 kW) }
              }
              rule c {
                runs on ground
                severity high
                when tarn/probe.girth above 5 m
                then { send moor/probe.head set_power(power = 6 kW) }
              }
              rule d {
                runs on board
                severity high
                when tarn/probe.depth minus fell/probe.depth above 5 kW
                then { send fell/probe enter_safe_mode }
              }
            """);
        var folder = TestFolders.New();
        await File.WriteAllTextAsync(Path.Combine(folder, "s.yaml"), scenario.Text);
        var lines = scenario.Text.Split('\n');
        string At(string text)
        {
            var line = Array.FindIndex(lines, Array.IndexOf(lines, "mission_rules: |"), l => l.Contains(text, StringComparison.Ordinal));
            return $"s.yaml:{line + 1}:{lines[line].IndexOf(text, StringComparison.Ordinal) + 1}: field 'mission_rules'";
        }

        var (exit, stdout, stderr) = await InProcessTool.RunAsync(folder, "check", "s.yaml");
        Assert.True(exit == 3, stdout + stderr);
        Assert.Contains($"error: {At("moor/probe.depth")}: UnknownLander: unknown lander 'moor'", stdout);
        Assert.Contains($"error: {At("fell/probe.head_power")}: UnitMismatch:", stdout);
        Assert.Contains($"error: {At("tarn/probe.girth")}: UnknownPoint:", stdout);
        Assert.Contains($"error: {At("moor/probe.head")}: UnknownLander:", stdout);
        Assert.Contains($"error: {At("5 kW")}: UnitMismatch:", stdout);
        Assert.Contains("s.yaml: 5 errors", stdout);

        // Without the other errors, the rule on board is refused at its rule.
        var onBoard = TestScenario.BuiltIn(Name).AddSection(Comparing.Replace("runs on ground", "runs on board", StringComparison.Ordinal));
        await File.WriteAllTextAsync(Path.Combine(folder, "board.yaml"), onBoard.Text);
        (exit, stdout, stderr) = await InProcessTool.RunAsync(folder, "check", "board.yaml");
        Assert.True(exit == 3, stdout + stderr);
        Assert.Contains("field 'mission_rules': PlacementNotAllowed: mission rule 'fell-falls-behind' runs on board", stdout);

        // A run refuses it too, before it starts, naming the field.
        var refused = Assert.Throws<ScenarioException>(() => Running.MissionAssembly.Components(onBoard.Load()));
        Assert.Equal("mission_rules", Assert.Single(refused.Errors).FieldPath);
    }

    [Fact]
    public async Task Coverage_of_a_run_lists_the_mission_rules_with_the_landers_rules()
    {
        var folder = TestFolders.New();
        await File.WriteAllTextAsync(Path.Combine(folder, "s.yaml"), TestScenario.BuiltIn(Name).AddSection(Comparing).Text);
        // Exit 4: the run ends at its time limit without completing the mission (README's table).
        var (exit, stdout, stderr) = await InProcessTool.RunAsync(folder, "run", "s.yaml", "--until", "2 d", "--log", "run.jsonl");
        Assert.True(exit == 4, stdout + stderr);
        (exit, stdout, stderr) = await InProcessTool.RunAsync(folder, "check", "s.yaml", "--coverage", "run.jsonl");
        Assert.True(exit == 0, stdout + stderr);
        // The landers' two rules (slow-descent-watch for tarn and brack, fell-stall-watch) and the mission's one.
        Assert.Matches(@"run\.jsonl: \d of 3 rules acted", stdout);
        var neverActed = stdout.Split('\n')[0].Split("never acted:") is [_, var list] ? list : "";
        Assert.DoesNotContain("fell-falls-behind", neverActed);
    }

    [Fact]
    public void Mission_rules_without_landers_are_refused_at_their_line()
    {
        var single = TestScenario.Default.AddSection(Comparing);
        var error = Assert.Single(Assert.Throws<ScenarioException>(single.Load).Errors);
        Assert.Equal("mission_rules", error.FieldPath);
        Assert.Equal(Array.FindIndex(single.Text.Split('\n'), l => l.StartsWith("mission_rules:", StringComparison.Ordinal)) + 1, error.Location.Line);
        Assert.Contains("no 'landers' list", error.Message);
    }
}
