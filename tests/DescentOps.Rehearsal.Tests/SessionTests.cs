using System.Text.Json.Nodes;
using DescentOps.Cli.Running;
using DescentOps.Journal;
using DescentOps.Journal.Comparison;
using DescentOps.Mission.Running;
using DescentOps.Scenarios;
using DescentOps.Scenarios.Loading;

namespace DescentOps.Rehearsal.Tests;

/// <summary>Sessions driven by a made-up wall clock: what is journaled, what is refused, and that the log replays.</summary>
public sealed class SessionTests : IDisposable
{
    private readonly string _folder = Directory.CreateTempSubdirectory("descentops-rehearsal-").FullName;

    public void Dispose() => Directory.Delete(_folder, recursive: true);

    internal static RehearsalSession Prepare(string path, double pace, LoggedRun? from = null, double? atS = null) =>
        RehearsalLaunch.Prepare(ScenarioLoader.LoadText(BuiltInScenarios.Text("power-dip-load-shedding.yaml"), "power-dip-load-shedding.yaml"), pace, path, from, atS);

    [Fact]
    public async Task Inputs_are_journaled_at_their_instant_bad_ones_change_nothing_and_the_log_replays_identically()
    {
        var path = Path.Combine(_folder, "session.jsonl");
        var session = Prepare(path, pace: 3600);
        session.Start(0);
        session.Tick(10); // 10 h
        Assert.Equal(36000, session.NowS, 6);
        Assert.Equal(202, session.OfferFault(Json("""{"name":"dip","kind":"power_dip","duration":"6 h","remaining_fraction":0.3}""")).Status);
        Assert.Equal(400, session.OfferFault(Json("""{"name":"dip2","kind":"power_dip"}""")).Status);
        Assert.Equal(400, session.OfferPace(Json("""{"pace":-3}""")).Status);
        Assert.Equal(400, session.OfferMark(Json("""{"text":"wrong field"}""")).Status);
        var refused = session.OfferCommand(Json("""{"text":"send probe.wall set_power(power = 9 kW)"}"""));
        Assert.Equal(422, refused.Status);
        Assert.StartsWith("command:1:", refused.Error, StringComparison.Ordinal);
        session.Tick(11);
        Assert.Equal(202, session.OfferCommand(Json("""{"text":"send probe.wall set_power(power = 2 kW)"}""")).Status);
        Assert.Equal(202, session.OfferMark(Json("""{"note":"after the command"}""")).Status);
        Assert.Equal(202, session.OfferPace(Json("""{"paused":true}""")).Status);
        session.Tick(12);
        session.Tick(20); // paused: no time passes
        Assert.Equal(3600 * 12, session.NowS, 3);
        Assert.Equal(202, session.OfferPace(Json("""{"paused":false,"pace":7200}""")).Status);
        session.Tick(21);
        session.Tick(22);
        // The resume is handed over at the tick of wall second 21 and counts from there.
        Assert.Equal(3600 * 12 + 7200, session.NowS, 3);
        Assert.Equal(202, session.End().Status);
        session.Tick(23);
        Assert.True(session.Ended);
        Assert.Equal(409, session.OfferMark(Json("""{"note":"too late"}""")).Status);

        var events = Events(path);
        var inputs = events.Where(e => e.Kind == "operator.input").ToList();
        Assert.Equal(["fault", "command", "mark", "pace", "pace", "end"], inputs.Select(e => e.Data.Single(f => f.Name == "input").Text));
        // Offered at 10 h, handed over at the next tick (11 h, which is a frame instant, so one microsecond after it).
        Assert.Equal(39600.000001, inputs[0].TimeSeconds, 9);
        Assert.Contains(events, e => e.Kind == "fault.injected" && e.Data.Any(f => f.Text == "dip"));
        Assert.Contains(events, e => e.Kind == "command.executed" && e.Data.Any(f => f.Text == "console-2"));

        Assert.True(JournalVerifier.Verify(path).Ok);
        foreach (var kernel in new[] { KernelChoice.Actors, KernelChoice.Sequential })
        {
            var (divergence, lines) = await LogReplay.CompareAsync(LoggedRun.Open(path), kernel);
            Assert.Null(divergence);
            Assert.True(lines > 100);
        }
    }

    [Fact]
    public async Task A_session_from_a_logged_run_re_runs_it_to_the_instant_and_goes_on_from_there()
    {
        var parentPath = Path.Combine(_folder, "parent.jsonl");
        var parent = Prepare(parentPath, pace: 86400);
        parent.Start(0);
        parent.Tick(0.5);
        Assert.Equal(202, parent.OfferFault(Json("""{"name":"early","kind":"power_dip","duration":"2 h","remaining_fraction":0.5}""")).Status);
        parent.Tick(1); // handed over at day 1
        parent.Tick(2);
        Assert.Equal(202, parent.OfferFault(Json("""{"name":"late","kind":"tilt_kick","angle":"2 deg"}""")).Status);
        parent.Tick(3);
        parent.End();
        parent.Tick(3.1);

        var childPath = Path.Combine(_folder, "child.jsonl");
        var child = Prepare(childPath, pace: 86400, LoggedRun.Open(parentPath), atS: 1.5 * 86400);
        child.Start(100);
        Assert.Equal(1.5 * 86400, child.NowS, 6);
        child.Tick(100.5);
        child.End();
        child.Tick(101);

        var childEvents = Events(childPath);
        Assert.Contains(childEvents, e => e.Kind == "fault.injected" && e.Data.Any(f => f.Text == "early"));
        Assert.DoesNotContain(childEvents, e => e.Kind == "fault.injected" && e.Data.Any(f => f.Text == "late"));
        var diff = JournalDiff.Compare(parentPath, childPath);
        Assert.True(diff.FirstEventDivergence is null || (diff.FirstEventDivergence.TimeA ?? double.MaxValue) >= 1.5 * 86400);
        var (divergence, _) = await LogReplay.CompareAsync(LoggedRun.Open(childPath));
        Assert.Null(divergence);
    }

    internal static JsonObject Json(string text) => JsonNode.Parse(text)!.AsObject();

    internal static List<EventEntry> Events(string path)
    {
        var events = new List<EventEntry>();
        using var reader = JournalReader.Open(path);
        while (reader.TryRead(out var entry))
        {
            if (entry is EventEntry e) events.Add(e);
        }

        return events;
    }
}
