using System.Globalization;
using System.Text.Json.Nodes;
using DescentOps.Campaigns.Statistics;
using DescentOps.Scenarios.Loading;
using DescentOps.Tests.Shared;
using Xunit;

namespace DescentOps.Campaigns.Tests;

/// <summary>Campaigns of a scenario with landers: each lander's figures, criteria and rates, checked against the runs' own logs.</summary>
public sealed class LanderCampaignTests
{
    [Fact]
    public async Task A_landers_criterion_in_a_three_lander_campaign_is_what_the_runs_logs_say()
    {
        var dir = CampaignFixture.TempDir();
        var (exit, stdout, stderr) = await CampaignFixture.CliOutputAsync("campaign", LanderCampaignScenario.File(), "--runs", "12", "--seed", "5", "--jobs", "2", "--output", dir);
        Assert.True(exit == 0, stdout + stderr);
        using var store = CampaignStore.Open(Path.Combine(dir, "campaign.sqlite"));
        var runs = store.Runs();
        Assert.Equal(12, runs.Count);
        var fellPassed = 0;
        var fellSucceeded = 0;
        foreach (var run in runs)
        {
            // The run's log, regenerated, read here without the summary code: Fellside Rise's last reported depth, whether
            // its probe ever froze in, and whether Brack Hollow's station ended dead.
            var log = Path.Combine(dir, $"run{run.Index}.jsonl");
            Assert.Equal(0, await CampaignFixture.CliAsync("campaign", "log", dir, "--run", run.Index.ToString(CultureInfo.InvariantCulture), "--output", log));
            double? fellDepth = null;
            var fellFroze = false;
            var brackDead = false;
            foreach (var line in File.ReadLines(log))
            {
                var node = JsonNode.Parse(line)!;
                if (node["type"]!.GetValue<string>() != "event") continue;
                var source = node["source"]!.GetValue<string>();
                var kind = node["kind"]!.GetValue<string>();
                var data = node["data"]!;
                if (source == "fell/probe" && kind is "probe.telemetry" or "probe.breakthrough") fellDepth = data["depth_m"]!.GetValue<double>();
                if (source == "fell/probe" && kind == "probe.regime" && data["to"]!.GetValue<string>() == "FrozenIn") fellFroze = true;
                if (source == "brack/station" && kind == "station.failed") brackDead = true;
                if (source == "brack/station" && kind == "station.recovered") brackDead = false;
            }

            File.Delete(log);
            Assert.Equal(["tarn", "brack", "fell"], run.Landers.Select(l => l.Lander));
            var fell = run.Landers.Single(l => l.Lander == "fell");
            Assert.Equal(fellDepth, fell.FinalDepthM);
            Assert.Equal(fellFroze, fell.Stalled);
            Assert.Equal(brackDead, run.Landers.Single(l => l.Lander == "brack").StationDead);

            // The criterion's own words: "final_depth above 120 m" on Fellside Rise.
            var met = fellDepth > LanderCampaignScenario.FellDepthM;
            var judged = fell.Criteria.Single(c => c.Name == LanderCampaignScenario.FellCriterion);
            Assert.Equal(met, judged.Passed);
            Assert.Equal(fellDepth, judged.Value);
            Assert.Equal(met, run.Criteria.Single(c => c.Name == LanderCampaignScenario.FellCriterion).Passed);

            // Fellside's criteria are its own, every-lander and any-lander ones; Tarn Flats is not judged on Fellside's.
            Assert.Equal(["fell-deep-enough", "never-frozen", "one-deep"], fell.Criteria.Select(c => c.Name));
            Assert.Equal(["never-frozen", "one-deep"], run.Landers.Single(l => l.Lander == "tarn").Criteria.Select(c => c.Name));
            if (!fellFroze) Assert.True(fell.Criteria.Single(c => c.Name == "never-frozen").Passed);
            Assert.Equal(run.Outcome == "Completed" && fell.Criteria.All(c => c.Passed), fell.Success);
            Assert.Equal(run.Landers.All(l => l.Criteria.Single(c => c.Name == "never-frozen").Passed), run.Criteria.Single(c => c.Name == "never-frozen").Passed);
            Assert.Equal(run.Landers.Any(l => l.Criteria.Single(c => c.Name == "one-deep").Passed), run.Criteria.Single(c => c.Name == "one-deep").Passed);
            fellPassed += met ? 1 : 0;
            fellSucceeded += fell.Success ? 1 : 0;
        }

        // Both verdicts occur, so the comparison above could fail either way.
        Assert.InRange(fellPassed, 1, 11);

        var summary = JsonNode.Parse(File.ReadAllText(Path.Combine(dir, "summary.json")))!;
        var fellNode = summary["variants"]![0]!["landers"]!.AsArray().Single(l => l!["name"]!.GetValue<string>() == "fell")!;
        Assert.Equal(12, fellNode["runs"]!.GetValue<int>());
        Assert.Equal(fellPassed, fellNode["criteria_passed"]![LanderCampaignScenario.FellCriterion]!.GetValue<int>());
        Assert.Equal(fellSucceeded, fellNode["successes"]!.GetValue<int>());
        var (low, high) = WilsonInterval.Compute95(fellSucceeded, 12);
        Assert.Equal(low, fellNode["success_ci95"]![0]!.GetValue<double>());
        Assert.Equal(high, fellNode["success_ci95"]![1]!.GetValue<double>());
        var page = File.ReadAllText(Path.Combine(dir, "report.html"));
        Assert.Contains("<h2>Per lander</h2>", page, StringComparison.Ordinal);
        Assert.Contains("Success per lander", page, StringComparison.Ordinal);
    }

    [Fact]
    public void A_variants_fault_for_one_lander_acts_in_a_campaign_with_drawn_inputs()
    {
        var scenario = ScenarioLoader.LoadText(LanderCampaignScenario.Text, "three-landers-campaign.yaml");
        const string change = """
            add_faults:
              - name: cairn-dies
                lander: tarn
                kind: station_failure
                at: 2 d
            """;
        var variant = new CampaignVariant("cairn-dies", change);
        var plan = new CampaignPlan(scenario, [CampaignVariant.Baseline, variant], 5, scenario.Run.UntilS, "test-build", Engine.Randomness.RandomStream.AlgorithmName);
        var baseline = RunExecutor.Execute(plan, plan.Spec(CampaignVariant.BaselineName, 0));
        var changed = RunExecutor.Execute(plan, plan.Spec("cairn-dies", 0));
        Assert.Equal(baseline.Inputs, changed.Inputs); // the same draws
        Assert.False(baseline.Landers.Single(l => l.Lander == "tarn").StationDead);
        Assert.True(changed.Landers.Single(l => l.Lander == "tarn").StationDead); // the added fault reached the lander's own components
        Assert.Contains(changed.Faults, f => f.Fault == "cairn-dies");
    }

    [Fact]
    public async Task A_single_lander_campaign_has_no_lander_rows_or_keys()
    {
        var dir = CampaignFixture.TempDir();
        Assert.Equal(0, await CampaignFixture.CliAsync("campaign", CampaignFixture.Scenario, "--runs", "2", "--seed", "4", "--output", dir));
        var summary = File.ReadAllText(Path.Combine(dir, "summary.json"));
        Assert.DoesNotContain("\"landers\"", summary, StringComparison.Ordinal);
        Assert.DoesNotContain("Per lander", File.ReadAllText(Path.Combine(dir, "report.html")), StringComparison.Ordinal);
        var dump = CampaignFixture.Dump(dir);
        Assert.Contains("landers\nlander_criteria\nrule_coverage\n", dump, StringComparison.Ordinal); // both lander tables empty
    }

    [Fact]
    public async Task A_layout_1_store_is_brought_to_the_present_layout_and_keeps_its_runs()
    {
        var dir = CampaignFixture.TempDir();
        Assert.Equal(0, await CampaignFixture.CliAsync("campaign", CampaignFixture.Scenario, "--runs", "2", "--seed", "4", "--output", dir));
        var before = CampaignFixture.Dump(dir);
        // Layout 1 as it was: the same tables without the lander and coverage ones (which a single-lander run without
        // procedures fills with its rules only: they go, and come back empty).
        CampaignFixture.Execute(dir, "DROP TABLE landers; DROP TABLE lander_criteria; DROP TABLE rule_coverage; DROP TABLE procedure_branches; PRAGMA user_version = 1;");
        using (var store = CampaignStore.Open(Path.Combine(dir, "campaign.sqlite")))
        {
            Assert.Equal(2, store.Runs().Count);
        }

        var after = CampaignFixture.Dump(dir);
        Assert.Equal(before[..before.IndexOf("rule_coverage\n", StringComparison.Ordinal)], after[..after.IndexOf("rule_coverage\n", StringComparison.Ordinal)]);
        Assert.EndsWith("rule_coverage\nprocedure_branches\n", after, StringComparison.Ordinal);
        CampaignFixture.Execute(dir, $"PRAGMA user_version = {CampaignStore.LayoutVersion + 1};");
        Assert.Contains($"layout {CampaignStore.LayoutVersion + 1}", Assert.Throws<InvalidDataException>(() => CampaignStore.Open(Path.Combine(dir, "campaign.sqlite"))).Message, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("lander: nobody", "criteria[0].lander", "no lander is named 'nobody'")]
    [InlineData("lander: fell\n    landers: any", "criteria[0].landers", "not both")]
    [InlineData("landers: some", "criteria[0].landers", "some")]
    public void A_criterions_lander_is_checked_at_its_place(string scope, string field, string message)
    {
        var scenario = TestScenario.BuiltIn("three-landers-shared-link.yaml").AddSection($"criteria:\n  - name: c\n    require: final_depth above 1 m\n    {scope}\n");
        var error = Assert.Throws<ScenarioException>(() => scenario.Load());
        var found = error.Errors.FirstOrDefault(e => e.FieldPath == field);
        Assert.True(found is not null, string.Join("\n", error.Errors));
        Assert.Contains(message, found.Message, StringComparison.Ordinal);
        Assert.True(found.Location.Line > 150, found.ToString()); // the criteria section's line, not the file's start
    }

    [Fact]
    public void A_scenario_without_landers_refuses_a_criterions_lander()
    {
        var scenario = TestScenario.BuiltIn("default.yaml").AddSection("criteria:\n  - name: c\n    require: final_depth above 1 m\n    lander: fell\n");
        var error = Assert.Throws<ScenarioException>(() => scenario.Load());
        Assert.Contains(error.Errors, e => e.FieldPath == "criteria[0].lander" && e.Message.Contains("no landers list", StringComparison.Ordinal));
    }
}
