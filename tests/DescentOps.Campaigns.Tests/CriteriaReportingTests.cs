using System.Text.Json.Nodes;
using Xunit;

namespace DescentOps.Campaigns.Tests;

/// <summary>
/// A single run reports each criterion of the scenario, in its printed summary, in its log's summary line and in its
/// HTML report, and the verdicts agree with the measures the summary line gives (recomputed here from the
/// criteria's own words in short-stall.yaml: "breakthrough below 20 d", "longest_stop below 2 d").
/// </summary>
public sealed class CriteriaReportingTests
{
    [Theory]
    [InlineData("3 d")]
    [InlineData("20 d")]
    public async Task A_single_run_reports_each_criterion_in_its_summary_and_its_report(string until)
    {
        var dir = CampaignFixture.TempDir();
        var log = Path.Combine(dir, "run.jsonl");
        var (exit, stdout, _) = await CampaignFixture.CliOutputAsync("run", CampaignFixture.Scenario, "--seed", "2", "--until", until, "--log", log, "--kernel", "sequential");
        Assert.True(exit is 0 or 4, $"exit {exit}"); // 4: the run ended without completing (the 3 d time limit)

        var line = JsonNode.Parse(File.ReadLines(log).Last())!;
        var summary = line["data"]!.AsObject();
        var completed = line["outcome"]!.GetValue<string>() == "Completed";
        Assert.Equal(completed ? 0 : 4, exit);
        var breakthrough = summary["breakthrough_t_s"]!.GetValueKind() == System.Text.Json.JsonValueKind.Number ? summary["breakthrough_t_s"]!.GetValue<double>() : double.NaN;
        var onTime = breakthrough < 20 * 86400.0;
        var shortStops = summary["longest_stop_s"]!.GetValue<double>() < 2 * 86400.0;
        Assert.Equal(onTime, summary["criterion.on-time"]!.GetValue<bool>());
        Assert.Equal(shortStops, summary["criterion.short-stops"]!.GetValue<bool>());
        Assert.Equal(completed && onTime && shortStops, summary["success"]!.GetValue<bool>());

        static string Verdict(bool met) => met ? " met: " : " NOT met: ";
        Assert.Contains("criterion on-time" + new string(' ', 13 - "on-time".Length) + Verdict(onTime).TrimStart(), stdout, StringComparison.Ordinal);
        Assert.Contains("criterion short-stops" + new string(' ', 13 - "short-stops".Length) + Verdict(shortStops).TrimStart(), stdout, StringComparison.Ordinal);

        var html = Path.Combine(dir, "run.html");
        Assert.Equal(0, await CampaignFixture.CliAsync("report", log, "-o", html));
        var page = File.ReadAllText(html);
        var table = page[page.IndexOf("id=\"criteria\"", StringComparison.Ordinal)..];
        table = table[..table.IndexOf("</table>", StringComparison.Ordinal)];
        Assert.Contains($"<th scope=\"row\">on-time</th><td>{(onTime ? "met" : "NOT met")}</td>", table, StringComparison.Ordinal);
        Assert.Contains($"<th scope=\"row\">short-stops</th><td>{(shortStops ? "met" : "NOT met")}</td>", table, StringComparison.Ordinal);
    }
}
