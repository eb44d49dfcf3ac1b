using DescentOps.Records;
using DescentOps.Records.Kinds;
using DescentOps.Scenarios;
using DescentOps.Scenarios.Loading;

namespace DescentOps.Mission.Tests.Landers;

/// <summary>
/// The built-in three-lander scenario tells its story: Fellside's stall waits for Fellside's window before the team
/// sees it, Rook's death loses what it held and hands its windows to the others by precedence, and every lander's
/// frame ledger closes.
/// </summary>
public sealed class ThreeLandersScenarioTests
{
    private const string Name = "three-landers-shared-link.yaml";
    private const double Hour = 3600;

    private static async Task<CollectingSink> RunTwoDaysAsync()
    {
        var loaded = ScenarioLoader.LoadText(BuiltInScenarios.Text(Name), "builtin:" + Name);
        var scenario = loaded with { Run = loaded.Run with { UntilS = 2 * 24 * Hour } };
        var (_, sink) = await MissionHarness.RunAsync(scenario);
        return sink;
    }

    private static string Lander(JournalRecord r) => CollectingSink.TextField(r, "lander");

    [Fact]
    public async Task The_team_learns_of_the_stall_only_when_the_stalled_lander_s_window_opens()
    {
        var sink = await RunTwoDaysAsync();
        var plan = ScenarioLoader.LoadText(BuiltInScenarios.Text(Name), Name).LinkHome!;
        var light = CollectingSink.Field(sink.OfKind(LinkRecords.Started).Single(), "one_way_light_time_s");
        var died = sink.OfKind(StationRecords.Failed).Single(r => Lander(r) == "brack").Time.SecondsSinceEpoch;

        var stalled = sink.Records.First(r => r.Source.Name == "fell/probe" && r.Kind == ProbeRecords.Regime && CollectingSink.TextField(r, "to") == "FrozenIn");
        var t = stalled.Time.SecondsSinceEpoch;
        var period = plan.RepeatS!.Value;
        double NextStart(string lander, double after) =>
            plan.Windows.Where(w => w.Lander == lander).Select(w => Math.Floor(after / period) * period + w.FromS).Select(s => s >= after ? s : s + period).Min();
        var ownTurn = NextStart("fell", t);
        var freedTurn = NextStart("brack", Math.Max(t, died));
        Assert.True(freedTurn < ownTurn, "the dead station's window comes before Fellside's own");
        var firstSeen = sink.Records.First(r => r.Source.Name == "fell/ground" && r.Kind == GroundRecords.Telemetry && r.Time > stalled.Time);
        // The first frame after the stall reaches the desk one light time after the freed window opens (plus its 3.2 s on the air).
        Assert.InRange(firstSeen.Time.SecondsSinceEpoch, freedTurn + light, freedTurn + light + 60);
        var fired = sink.Records.First(r => r.Kind == RuleRecords.Fired && Lander(r) == "fell");
        Assert.True(fired.Time >= firstSeen.Time);
    }

    [Fact]
    public async Task A_dead_station_loses_what_it_held_and_its_windows_go_to_the_others_by_precedence()
    {
        var sink = await RunTwoDaysAsync();
        var died = sink.OfKind(StationRecords.Failed).Single(r => Lander(r) == "brack").Time.SecondsSinceEpoch;
        var down = sink.OfKind(LinkRecords.StationDown).Single();
        var lost = sink.Records.Single(r => r.Source == MissionIds.LinkHome && r.Kind == StationRecords.DataLost);
        Assert.Equal(CollectingSink.IntegerField(down, "frames_lost"), CollectingSink.IntegerField(lost, "count"));
        Assert.Equal(0, CollectingSink.IntegerField(down, "frames_queued"));

        // Brack's next window (8 h to 16 h of the day) after the death is worked by fell first (it leads the precedence).
        var day = Math.Floor(died / (24 * Hour)) * 24 * Hour;
        var inBrackWindow = sink.OfKind(LinkRecords.Sent).Where(r => r.Time.SecondsSinceEpoch >= day + 8 * Hour && r.Time.SecondsSinceEpoch < day + 16 * Hour && r.Time.SecondsSinceEpoch > died).ToList();
        Assert.NotEmpty(inBrackWindow);
        Assert.DoesNotContain(inBrackWindow, r => Lander(r) == "brack");
        Assert.Equal("fell", Lander(inBrackWindow[0]));
    }

    [Fact]
    public async Task Every_lander_s_ledger_closes_and_the_link_never_carries_two_frames_at_once()
    {
        var sink = await RunTwoDaysAsync();
        var sent = sink.OfKind(LinkRecords.Sent).ToList();
        foreach (var lander in new[] { "tarn", "brack", "fell" })
        {
            var last = sink.Records.Last(r => r.Source == MissionIds.LinkHome && r.Fields.Any(f => f.Name == "frames_offered") && Lander(r) == lander);
            Assert.Equal(
                CollectingSink.IntegerField(last, "frames_offered"),
                CollectingSink.IntegerField(last, "frames_sent") + CollectingSink.IntegerField(last, "frames_lost") + CollectingSink.IntegerField(last, "frames_queued"));
            Assert.Equal(sent.Count(r => Lander(r) == lander), CollectingSink.IntegerField(last, "frames_sent"));
        }

        // One channel: each frame's time on the air ends before the next one starts (the radio's 3.2 s frames).
        var spans = sent.Select(r => (Start: r.Time.SecondsSinceEpoch, End: r.Time.SecondsSinceEpoch + CollectingSink.Field(r, "on_air_s"))).ToList();
        Assert.All(spans, s => Assert.True(s.End > s.Start));
        for (var i = 1; i < spans.Count; i++) Assert.True(spans[i].Start >= spans[i - 1].End - 1e-6, $"two frames on the air at {spans[i].Start} s");
    }
}
