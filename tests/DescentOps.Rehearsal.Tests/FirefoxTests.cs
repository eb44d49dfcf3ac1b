using System.Globalization;
using System.Net;
using DescentOps.Journal;
using DescentOps.Rehearsal.Web;

namespace DescentOps.Rehearsal.Tests;

/// <summary>
/// The rehearsal pages in a real headless Firefox (Debian's <c>firefox-esr</c>, driven over WebDriver BiDi): live data
/// arrives on both views, the supervisor springs a power dip from its form, the team's page shows it once the link has
/// brought it down, a telecommand from the team's form is executed, the session ends from the supervisor's page, no
/// script error is reported, and the log verifies. The Chromium test covers the same path in more detail.
/// </summary>
public sealed class FirefoxTests : IDisposable
{
    private const double Pace = 1200;
    private readonly string _folder = Directory.CreateTempSubdirectory("descentops-firefox-test-").FullName;

    public void Dispose() => Directory.Delete(_folder, recursive: true);

    [Fact]
    public async Task Supervisor_and_team_pages_work_in_firefox()
    {
        Assert.True(File.Exists(FirefoxRemote.Executable) || Environment.GetEnvironmentVariable("CI") != "true", "CI must install firefox-esr (.ci/run does)");
        if (!File.Exists(FirefoxRemote.Executable)) return; // a developer machine without firefox; CI fails above instead

        var path = Path.Combine(_folder, "rehearsal.jsonl");
        var session = SessionTests.Prepare(path, Pace);
        await using var server = await RehearsalServer.StartAsync(session, new IPEndPoint(IPAddress.Loopback, 0),
            new ServerLimits { MaxRequests = 5000, MaxLifetime = TimeSpan.FromSeconds(150) });
        await using var firefox = await FirefoxRemote.LaunchAsync();
        var wait = TimeSpan.FromSeconds(45);

        var team = await firefox.OpenAsync(server.PageAddress("team"));
        var supervisor = await firefox.OpenAsync(server.PageAddress("supervisor"));
        const string Available = "document.querySelector(\"#latest td[data-point='probe.bus_power_available']\")";
        await firefox.WaitForAsync(team, Available + " && " + Available + ".dataset.value", wait, "the team's first frame");
        await firefox.WaitForAsync(team, "document.querySelector('canvas')", wait, "the team's plots");
        var before = double.Parse((await firefox.EvaluateAsync(team, Available + ".dataset.value"))!.GetValue<string>(), CultureInfo.InvariantCulture);

        // The supervisor's form fills its fault kinds from the server after the page loads: wait for them, as a person
        // would (Playwright's select does the same wait in the Chromium test).
        await firefox.WaitForAsync(supervisor, "document.querySelector(\"#fault-kind option[value='power_dip']\")", wait, "the supervisor's fault kinds");

        // The supervisor's form, as a person fills it: the kind (which builds its fields), 30 % remaining, inject.
        await firefox.EvaluateAsync(supervisor, """
            (() => {
              const kind = document.getElementById("fault-kind");
              kind.value = "power_dip";
              kind.dispatchEvent(new Event("change"));
              document.getElementById("ff-remaining_fraction").value = "0.3";
              document.getElementById("fault-inject").click();
              return true;
            })()
            """);
        await firefox.WaitForAsync(supervisor, "document.querySelector('#fault-msg.good')", wait, "the injection's confirmation");
        await firefox.WaitForAsync(team, Available + " && Number(" + Available + ".dataset.value) < " + (0.8 * before).ToString("R", CultureInfo.InvariantCulture), wait, "the dip on the team's page");

        await firefox.EvaluateAsync(team, """
            (() => {
              document.getElementById("command-text").value = "send probe.wall set_power(power = 2 kW)";
              document.getElementById("command-send").click();
              return true;
            })()
            """);
        await firefox.WaitForAsync(team, "document.querySelector(\"#progress td.status[data-status='executed']\")", wait, "the telecommand's execution");
        await firefox.ScreenshotAsync(team, Path.Combine(OutputFolder(), "team-firefox.png"));
        await firefox.ScreenshotAsync(supervisor, Path.Combine(OutputFolder(), "supervisor-firefox.png"));

        await firefox.EvaluateAsync(supervisor, "(() => { document.getElementById('end').click(); return true; })()");
        await server.Ended.WaitAsync(TimeSpan.FromSeconds(30));
        Assert.True(firefox.ConsoleErrors.Count == 0, string.Join("\n", firefox.ConsoleErrors));
        Assert.True(JournalVerifier.Verify(path).Ok);
        var inputs = SessionTests.Events(path).Where(e => e.Kind == "operator.input").Select(e => e.Data.Single(f => f.Name == "input").Text);
        Assert.Equal(["fault", "command", "end"], inputs);
    }

    private static string OutputFolder() => Directory.CreateDirectory(Path.Combine(AppContext.BaseDirectory, "rehearsal-screens")).FullName;
}
