using System.Globalization;
using System.Text.Json.Nodes;
using Xunit;

namespace DescentOps.Campaigns.Tests;

/// <summary>A campaign's coverage table: per rule and per procedure branch, the runs that exercised it, against each run's log.</summary>
public sealed class CampaignCoverageTests
{
    [Fact]
    public async Task A_campaigns_coverage_counts_what_check_coverage_finds_in_each_runs_log()
    {
        var scenario = CoverageCampaignScenario.File();
        var dir = CampaignFixture.TempDir();
        var (exit, stdout, stderr) = await CampaignFixture.CliOutputAsync("campaign", scenario, "--runs", "12", "--seed", "3", "--jobs", "2", "--output", dir);
        Assert.True(exit == 0, stdout + stderr);
        using var store = CampaignStore.Open(Path.Combine(dir, "campaign.sqlite"));
        var runs = store.Runs();
        var ruleRuns = new Dictionary<string, int>(StringComparer.Ordinal);
        var branchRuns = new Dictionary<string, int>(StringComparer.Ordinal);
        foreach (var run in runs)
        {
            // `check SCENARIO --coverage LOG` on the run's regenerated log: the rules that never acted and the branches never taken.
            var log = Path.Combine(dir, $"run{run.Index}.jsonl");
            Assert.Equal(0, await CampaignFixture.CliAsync("campaign", "log", dir, "--run", run.Index.ToString(CultureInfo.InvariantCulture), "--output", log));
            var (checkExit, printed, checkErr) = await CampaignFixture.CliOutputAsync("check", scenario, "--coverage", log);
            Assert.True(checkExit == 0, printed + checkErr);
            File.Delete(log);
            var lines = printed.Split('\n', StringSplitOptions.RemoveEmptyEntries);
            var silent = lines[0].Contains("never acted: ", StringComparison.Ordinal) ? lines[0][(lines[0].IndexOf("never acted: ", StringComparison.Ordinal) + 13)..].Split(", ") : [];
            var procedureLine = lines.Single(l => l.TrimStart().StartsWith("procedure free-frozen-probe:", StringComparison.Ordinal));
            var never = procedureLine.Contains("never: ", StringComparison.Ordinal) ? procedureLine[(procedureLine.IndexOf("never: ", StringComparison.Ordinal) + 7)..].Split(", ") : [];

            Assert.Equal(run.RulesActed.Where(r => !r.Acted).Select(r => r.Rule), silent);
            Assert.Equal(run.Branches.Where(b => b.Taken == 0).Select(b => $"{b.Step} {b.Branch}"), never);
            Assert.Equal(8, run.Branches.Count); // "1 of 1 rules, 3 of 8 procedure branches" on the scenario's own log (issue notes)
            Assert.Contains($"{run.Branches.Count(b => b.Taken > 0)} of 8 branches taken", procedureLine, StringComparison.Ordinal);
            foreach (var rule in run.RulesActed.Where(r => !silent.Contains(r.Rule))) ruleRuns[rule.Rule] = ruleRuns.GetValueOrDefault(rule.Rule) + 1;
            foreach (var b in run.Branches.Where(b => !never.Contains($"{b.Step} {b.Branch}"))) branchRuns[$"{b.Step} {b.Branch}"] = branchRuns.GetValueOrDefault($"{b.Step} {b.Branch}") + 1;
        }

        // The runs differ: some never start the procedure, some take the late branch (so the counts are not all or nothing).
        Assert.InRange(ruleRuns["frozen-in-seen"], 1, 11);
        Assert.True(branchRuns.ContainsKey("boost-wall late") && branchRuns.ContainsKey("boost-wall passed"), string.Join(", ", branchRuns));

        var variant = JsonNode.Parse(File.ReadAllText(Path.Combine(dir, "summary.json")))!["variants"]![0]!;
        Assert.Equal(ruleRuns["frozen-in-seen"], variant["rules_acted_in_runs"]!["frozen-in-seen"]!.GetValue<int>());
        foreach (var b in variant["procedure_branches"]!.AsArray())
        {
            var key = $"{b!["step"]} {b["branch"]}";
            Assert.Equal(branchRuns.GetValueOrDefault(key), b["runs"]!.GetValue<int>());
        }

        var page = File.ReadAllText(Path.Combine(dir, "report.html"));
        Assert.Contains("<h2>Procedure branches</h2>", page, StringComparison.Ordinal);
        Assert.Contains("procedure branches taken in some run: ", stdout, StringComparison.Ordinal);
    }

    [Fact]
    public async Task A_three_lander_campaigns_rule_coverage_names_every_landers_rules_as_check_coverage_does()
    {
        var scenario = LanderCampaignScenario.File();
        var dir = CampaignFixture.TempDir();
        Assert.Equal(0, await CampaignFixture.CliAsync("campaign", scenario, "--runs", "3", "--seed", "5", "--output", dir));
        using var store = CampaignStore.Open(Path.Combine(dir, "campaign.sqlite"));
        foreach (var run in store.Runs())
        {
            // The top level's rule and Fellside Rise's own, each once though every lander runs the first.
            Assert.Equal(["slow-descent-watch", "fell-stall-watch"], run.RulesActed.Select(r => r.Rule));
            var log = Path.Combine(dir, $"run{run.Index}.jsonl");
            Assert.Equal(0, await CampaignFixture.CliAsync("campaign", "log", dir, "--run", run.Index.ToString(CultureInfo.InvariantCulture), "--output", log));
            var (exit, printed, stderr) = await CampaignFixture.CliOutputAsync("check", scenario, "--coverage", log);
            Assert.True(exit == 0, printed + stderr);
            var silent = run.RulesActed.Where(r => !r.Acted).Select(r => r.Rule).ToList();
            Assert.Contains($"{2 - silent.Count} of 2 rules acted{(silent.Count == 0 ? "" : $"; never acted: {string.Join(", ", silent)}")}", printed, StringComparison.Ordinal);
        }

        // The firing counts and the report's coverage table name the same rules as the coverage: every lander's, not the
        // first lander's alone (before, Fellside Rise's own rule had no row).
        var variant = JsonNode.Parse(File.ReadAllText(Path.Combine(dir, "summary.json")))!["variants"]![0]!;
        Assert.Equal(["slow-descent-watch", "fell-stall-watch"], variant["rules_fired_in_runs"]!.AsObject().Select(p => p.Key));
        Assert.Equal(["slow-descent-watch", "fell-stall-watch"], variant["rules_acted_in_runs"]!.AsObject().Select(p => p.Key));
    }
}
