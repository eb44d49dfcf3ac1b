using System.Diagnostics;
using System.Net;
using System.Net.Http.Json;
using System.Text.Json.Nodes;
using DescentOps.Cli.Running;
using DescentOps.Journal;
using DescentOps.Rehearsal.Web;
using Microsoft.Playwright;

namespace DescentOps.Rehearsal.Tests;

/// <summary>
/// The rehearsal end to end in a real headless Chromium (Debian's, through its executable path): the supervisor
/// springs a power dip, the team sees it only after the link delay, sends a telecommand and sees it executed, the
/// session ends, and its log verifies and replays identically. The server listens on loopback, answers at most a
/// bounded number of requests and ends itself after a bounded time.
/// </summary>
public sealed class BrowserTests : IDisposable
{
    private const double Pace = 1200;
    private readonly string _folder = Directory.CreateTempSubdirectory("descentops-browser-").FullName;

    public void Dispose() => Directory.Delete(_folder, recursive: true);

    [Fact]
    public async Task Supervisor_and_team_rehearse_a_power_dip_in_chromium_and_the_log_replays()
    {
        if (!DebianChromium.Present()) return; // a developer machine without chromium; CI fails instead

        var path = Path.Combine(_folder, "rehearsal.jsonl");
        var session = SessionTests.Prepare(path, Pace);
        await using var server = await RehearsalServer.StartAsync(session, new IPEndPoint(IPAddress.Loopback, 0),
            new ServerLimits { MaxRequests = 5000, MaxLifetime = TimeSpan.FromSeconds(120) });
        Assert.Equal("127.0.0.1", server.Address.Host);
        using var http = new HttpClient { BaseAddress = server.Address, Timeout = TimeSpan.FromSeconds(20) };

        // Security: no token, a wrong token, and bad JSON are refused; none of it reaches the log.
        Assert.Equal(HttpStatusCode.Unauthorized, (await http.GetAsync("api/session")).StatusCode);
        Assert.Equal(HttpStatusCode.Unauthorized, (await http.GetAsync("supervisor")).StatusCode);
        Assert.Equal(HttpStatusCode.Unauthorized, (await http.GetAsync("api/session?token=" + new string('0', 64))).StatusCode);
        Assert.Equal(HttpStatusCode.Unauthorized, (await http.PostAsync("api/end", null)).StatusCode);
        http.DefaultRequestHeaders.Add(SessionToken.HeaderName, server.Token.Value);
        var badJson = await http.PostAsync("api/faults", new StringContent("{\"name\": \"x\", ", System.Text.Encoding.UTF8, "application/json"));
        Assert.Equal(HttpStatusCode.BadRequest, badJson.StatusCode);
        Assert.StartsWith("body:", (await badJson.Content.ReadFromJsonAsync<JsonObject>())!["error"]!.GetValue<string>(), StringComparison.Ordinal);
        var badField = await http.PostAsync("api/pace", JsonContent.Create(new { pace = "fast" }));
        Assert.Equal(HttpStatusCode.BadRequest, badField.StatusCode);
        Assert.StartsWith("pace:", (await badField.Content.ReadFromJsonAsync<JsonObject>())!["error"]!.GetValue<string>(), StringComparison.Ordinal);

        // Pacing: simulated time advances Pace times the wall time, within 10 %, over about three seconds.
        var (sim0, wall0) = (await SimTimeAsync(http), Stopwatch.GetTimestamp());
        await Task.Delay(TimeSpan.FromSeconds(3));
        var (sim1, wall1) = (await SimTimeAsync(http), Stopwatch.GetTimestamp());
        var measuredPace = (sim1 - sim0) / Stopwatch.GetElapsedTime(wall0, wall1).TotalSeconds;
        File.WriteAllText(Path.Combine(OutputFolder(), "pacing.txt"), $"pace {Pace}: measured {measuredPace:F1} simulated s per s over {Stopwatch.GetElapsedTime(wall0, wall1).TotalSeconds:F2} s\n");
        Assert.InRange(measuredPace, Pace * 0.9, Pace * 1.1);

        using var playwright = await Playwright.CreateAsync();
        await using var browser = await DebianChromium.LaunchAsync(playwright);
        var errors = new List<string>();
        var supervisor = await browser.NewPageAsync(new BrowserNewPageOptions { ViewportSize = new ViewportSize { Width = 1400, Height = 1000 } });
        var team = await browser.NewPageAsync(new BrowserNewPageOptions { ViewportSize = new ViewportSize { Width = 1400, Height = 1200 } });
        foreach (var page in new[] { supervisor, team })
        {
            page.SetDefaultTimeout(30_000);
            // The refused command's 422 is logged by the browser as a failed resource; that one is expected.
            page.Console += (_, m) => { if (m.Type == "error" && !m.Text.Contains("status of 422", StringComparison.Ordinal)) errors.Add(m.Text); };
            page.PageError += (_, e) => errors.Add(e);
        }

        await supervisor.GotoAsync(server.PageAddress("supervisor").ToString());
        await team.GotoAsync(server.PageAddress("team").ToString());
        var available = team.Locator("#latest td[data-point='probe.bus_power_available']");
        await available.WaitForAsync();
        var before = double.Parse((await available.GetAttributeAsync("data-value"))!, System.Globalization.CultureInfo.InvariantCulture);

        // The supervisor springs a power dip (the form's first kind) leaving 30 % for 6 h, starting now.
        await supervisor.SelectOptionAsync("#fault-kind", "power_dip");
        await supervisor.FillAsync("#ff-remaining_fraction", "0.3");
        await supervisor.ClickAsync("#fault-inject");
        await supervisor.Locator("#fault-msg.good").WaitForAsync();
        var uplinkS = (await http.GetFromJsonAsync<JsonObject>("api/session"))!["uplink_s"]!.GetValue<double>();
        await supervisor.Locator("#active tr[data-fault]").WaitForAsync();

        // The team's page shows the sag only once a frame sampled after it has come down the link.
        await team.WaitForFunctionAsync(
            "b => { const c = document.querySelector(\"#latest td[data-point='probe.bus_power_available']\"); return c && Number(c.dataset.value) < 0.8 * b; }",
            before, new PageWaitForFunctionOptions { PollingInterval = 50 });
        var seenArrivedS = double.Parse((await team.GetAttributeAsync("#latest", "data-arrived"))!, System.Globalization.CultureInfo.InvariantCulture);

        // A telecommand from the team: checked, sent, and shown executed once the ground learns of it.
        await team.FillAsync("#command-text", "send probe.wall set_power(power = 9 kW)");
        await team.ClickAsync("#command-send");
        await team.Locator("#command-msg.bad").WaitForAsync();
        Assert.Contains("command:1:", await team.InnerTextAsync("#command-msg"), StringComparison.Ordinal);
        await team.FillAsync("#command-text", "send probe.wall set_power(power = 2 kW)");
        await team.ClickAsync("#command-send");
        await team.Locator("#command-msg.good").WaitForAsync();
        await team.Locator("#progress td.status[data-status='executed']").WaitForAsync();

        await supervisor.FillAsync("#mark-note", "team answered the dip");
        await supervisor.ClickAsync("#mark-add");
        await supervisor.Locator("#marks div").WaitForAsync();
        await team.WaitForTimeoutAsync(400);
        await supervisor.ScreenshotAsync(new PageScreenshotOptions { Path = Path.Combine(OutputFolder(), "supervisor.png"), FullPage = true });
        await team.ScreenshotAsync(new PageScreenshotOptions { Path = Path.Combine(OutputFolder(), "team.png"), FullPage = true });

        await supervisor.ClickAsync("#end");
        await server.Ended.WaitAsync(TimeSpan.FromSeconds(30));
        await supervisor.Locator("#outcome:has-text('ended at the console')").WaitForAsync();
        Assert.True(errors.Count == 0, string.Join("\n", errors));

        Assert.True(JournalVerifier.Verify(path).Ok);
        var events = SessionTests.Events(path);
        var dipS = events.First(e => e.Kind == "fault.injected").TimeSeconds;
        Assert.True(seenArrivedS - dipS >= uplinkS, $"the team saw the dip in a frame that arrived {seenArrivedS - dipS:F0} s after it began; the light time alone is {uplinkS:F0} s");
        Assert.Equal(["fault", "command", "mark", "end"], events.Where(e => e.Kind == "operator.input").Select(e => e.Data.Single(f => f.Name == "input").Text));
        var (divergence, lines) = await LogReplay.CompareAsync(LoggedRun.Open(path));
        Assert.Null(divergence);
        Assert.Equal(JournalVerifier.Verify(path).LinesChecked, lines);
    }

    private static async Task<double> SimTimeAsync(HttpClient http) =>
        (await http.GetFromJsonAsync<JsonObject>("api/session"))!["t_s"]!.GetValue<double>();

    private static string OutputFolder() => Directory.CreateDirectory(Path.Combine(AppContext.BaseDirectory, "rehearsal-screens")).FullName;
}
