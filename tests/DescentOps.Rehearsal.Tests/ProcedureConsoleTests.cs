using System.Net;
using DescentOps.Cli.Running;
using DescentOps.Journal;
using DescentOps.Rehearsal.Web;
using DescentOps.Scenarios;
using DescentOps.Scenarios.Loading;
using Microsoft.Playwright;
using static DescentOps.Rehearsal.Tests.SessionTests;

namespace DescentOps.Rehearsal.Tests;

/// <summary>
/// A procedure stepped through at the console: the ground starts it at 1 h into the built-in default scenario (an
/// invented mission), its first step asks for confirmation, a person confirms it by name, and the log records who and
/// when; the log replays identically. The browser test drives the team page in Debian's Chromium against a loopback
/// server bounded in requests and lifetime.
/// </summary>
public sealed class ProcedureConsoleTests : IDisposable
{

    private const string Procedure = """
        procedures:
          - name: wall-check
            start_at: 1 h
            steps:
              - name: raise-wall
                send: probe.wall set_power(power = 7 kW)
                confirm: true
                wait_for: probe.wall_power below 7.5 kW
                within: 6 h
              - name: report
                on_pass: done

        """;

    private readonly string _folder = Directory.CreateTempSubdirectory("descentops-procedure-console-").FullName;

    public void Dispose() => Directory.Delete(_folder, recursive: true);

    private static RehearsalSession Prepare(string path, double pace)
    {
        var text = BuiltInScenarios.Text("default.yaml");
        var at = text.IndexOf("\nrun:\n", StringComparison.Ordinal);
        Assert.True(at > 0);
        var scenario = ScenarioLoader.LoadText(text[..(at + 1)] + Procedure + text[(at + 1)..], "procedure-console.yaml");
        return RehearsalLaunch.Prepare(scenario, pace, path, null, null);
    }

    private static string Field(EventEntry e, string name) => e.Data.Single(f => f.Name == name).Text!;

    [Fact]
    public async Task A_step_that_asks_for_confirmation_waits_for_a_person_and_the_log_names_who_confirmed_and_when()
    {
        var path = Path.Combine(_folder, "session.jsonl");
        var session = Prepare(path, pace: 3600);
        session.Start(0);
        session.Tick(2); // 2 h: the procedure started at 1 h and waits
        var feed = new List<string>();
        session.ReadFeed(0, supervisor: false, 10_000, feed);
        Assert.Contains(feed, f => f.Contains("\"type\":\"procedure\"", StringComparison.Ordinal) && f.Contains("\"awaiting\":true", StringComparison.Ordinal));

        // Malformed answers are refused naming the field, and change nothing.
        Assert.StartsWith("procedure:", session.OfferStep(Json("""{"procedure":"nope","step":"raise-wall","answer":"confirm","by":"Ilse"}""")).Error, StringComparison.Ordinal);
        Assert.StartsWith("step:", session.OfferStep(Json("""{"procedure":"wall-check","step":"report","answer":"confirm","by":"Ilse"}""")).Error, StringComparison.Ordinal);
        Assert.StartsWith("answer:", session.OfferStep(Json("""{"procedure":"wall-check","step":"raise-wall","answer":"maybe","by":"Ilse"}""")).Error, StringComparison.Ordinal);
        Assert.StartsWith("by:", session.OfferStep(Json("""{"procedure":"wall-check","step":"raise-wall","answer":"confirm","by":" "}""")).Error, StringComparison.Ordinal);

        // Nothing moved while it waited: no command went.
        session.Tick(3);
        Assert.Equal(202, session.OfferStep(Json("""{"procedure":"wall-check","step":"raise-wall","answer":"confirm","by":"Ilse Marrow"}""")).Status);
        session.Tick(4); // handed over at 4 h: the command leaves, reaches the probe an uplink later, shows a downlink after
        // A second answer, handed over at 5 h while the step waits for its frame, no longer counts: logged and ignored.
        Assert.Equal(202, session.OfferStep(Json("""{"procedure":"wall-check","step":"raise-wall","answer":"skip","by":"Orrin Vale"}""")).Status);
        session.Tick(5);
        session.Tick(30);
        Assert.Equal(202, session.End().Status);
        session.Tick(31);
        Assert.True(session.Ended);

        var events = Events(path);
        var awaits = events.Single(e => e.Kind == "procedure.step_awaits_answer");
        Assert.Equal(3600, awaits.TimeSeconds, 6);
        var confirmed = events.Single(e => e.Kind == "procedure.step_confirmed");
        var input = events.First(e => e.Kind == "operator.input" && Field(e, "input") == "step");
        // Who and when: the name given, the console input's number, at the instant the input was handed over.
        Assert.Equal(("Ilse Marrow", input.Data.Single(f => f.Name == "number").Integer), (Field(confirmed, "by"), confirmed.Data.Single(f => f.Name == "input").Integer));
        Assert.Equal(input.TimeSeconds, confirmed.TimeSeconds, 9);
        Assert.DoesNotContain(events, e => e.Kind == "command.sent" && e.TimeSeconds < confirmed.TimeSeconds);
        var started = events.Single(e => e.Kind == "procedure.step_started" && Field(e, "step") == "raise-wall");
        Assert.Equal((confirmed.TimeSeconds, "probe.wall set_power(power=7000)"), (started.TimeSeconds, Field(started, "command")));
        Assert.Equal("the step does not wait for an answer", Field(events.Single(e => e.Kind == "procedure.answer_ignored"), "reason"));
        // It passes on a frame that shows the command acted: at least an uplink and a downlink (2 × 1.08e12 m at
        // 299 792 458 m/s) after the confirmation.
        var passed = events.Single(e => e.Kind == "procedure.step_passed" && Field(e, "step") == "raise-wall");
        Assert.True(passed.TimeSeconds - confirmed.TimeSeconds >= 2 * 1.08e12 / 299_792_458.0);

        var (divergence, _) = await LogReplay.CompareAsync(LoggedRun.Open(path));
        Assert.Null(divergence);
    }

    [Fact]
    public async Task The_team_page_shows_the_waiting_step_and_a_person_confirms_it_in_chromium()
    {
        if (!DebianChromium.Present()) return; // a developer machine without chromium; CI fails instead

        var path = Path.Combine(_folder, "browser.jsonl");
        var session = Prepare(path, pace: 1800);
        await using var server = await RehearsalServer.StartAsync(session, new IPEndPoint(IPAddress.Loopback, 0),
            new ServerLimits { MaxRequests = 2000, MaxLifetime = TimeSpan.FromSeconds(90) });
        Assert.Equal("127.0.0.1", server.Address.Host);

        using var playwright = await Playwright.CreateAsync();
        await using var browser = await DebianChromium.LaunchAsync(playwright);
        var errors = new List<string>();
        var team = await browser.NewPageAsync(new BrowserNewPageOptions { ViewportSize = new ViewportSize { Width = 1400, Height = 1200 } });
        team.SetDefaultTimeout(30_000);
        team.Console += (_, m) => { if (m.Type == "error") errors.Add(m.Text); };
        team.PageError += (_, e) => errors.Add(e);
        await team.GotoAsync(server.PageAddress("team").ToString());

        // The step waits at 1 h; its row shows the step, the status and the two answers.
        var row = team.Locator("#procedures tr[data-procedure='wall-check']");
        await row.Locator("td.status[data-status='waiting for confirmation']").WaitForAsync();
        Assert.Equal("raise-wall", await row.Locator("td.step").InnerTextAsync());
        await team.FillAsync("#answer-by", "Ilse Marrow");
        await row.Locator("button[data-answer='confirm']").ClickAsync();
        await team.Locator("#step-msg.good").WaitForAsync();
        // Confirmed, then running with its deadline, then passed once a frame shows the wall at 7 kW.
        await row.Locator("td.status[data-status='passed'], td.status[data-status='finished']").First.WaitForAsync();
        await team.ScreenshotAsync(new PageScreenshotOptions { Path = Path.Combine(Directory.CreateDirectory(Path.Combine(AppContext.BaseDirectory, "rehearsal-screens")).FullName, "procedure.png"), FullPage = true });

        await team.EvaluateAsync("() => fetch('/api/end', { method: 'POST', headers: { 'X-Session-Token': new URLSearchParams(location.search).get('token') } })");
        await server.Ended.WaitAsync(TimeSpan.FromSeconds(30));
        Assert.True(errors.Count == 0, string.Join("\n", errors));

        var events = Events(path);
        Assert.Equal("Ilse Marrow", Field(events.Single(e => e.Kind == "procedure.step_confirmed"), "by"));
        var (divergence, _) = await LogReplay.CompareAsync(LoggedRun.Open(path));
        Assert.Null(divergence);
    }
}
