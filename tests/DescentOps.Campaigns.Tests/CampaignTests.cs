using System.Text.Json.Nodes;
using DescentOps.Scenarios.Loading;
using DescentOps.Tests.Shared;
using Xunit;

namespace DescentOps.Campaigns.Tests;

public sealed class CampaignTests
{
    private static JsonObject Summary(string dir) => JsonNode.Parse(File.ReadAllText(Path.Combine(dir, "summary.json")))!.AsObject();

    [Fact]
    public async Task A_campaign_run_twice_gives_the_same_summary_and_tables_whatever_the_workers()
    {
        var a = CampaignFixture.TempDir();
        var b = CampaignFixture.TempDir();
        Assert.Equal(0, await CampaignFixture.CliAsync("campaign", CampaignFixture.Scenario, "--runs", "6", "--seed", "11", "--jobs", "2", "--output", a));
        Assert.Equal(0, await CampaignFixture.CliAsync("campaign", CampaignFixture.Scenario, "--runs", "6", "--seed", "11", "--jobs", "1", "--output", b));
        Assert.Equal(File.ReadAllText(Path.Combine(a, "summary.json")), File.ReadAllText(Path.Combine(b, "summary.json")));
        Assert.Equal(CampaignFixture.Dump(a), CampaignFixture.Dump(b));
        Assert.Contains("<svg", File.ReadAllText(Path.Combine(a, "report.html")), StringComparison.Ordinal);

        // `campaign show --json` prints the same figures as summary.json, from the stored runs.
        var (showExit, shown, _) = await CampaignFixture.CliOutputAsync("campaign", "show", a, "--json");
        Assert.Equal(0, showExit);
        Assert.Equal(File.ReadAllText(Path.Combine(a, "summary.json")), shown);

        // The drawn inputs are recorded per run and differ between runs (two inputs, six runs).
        Assert.Equal(12, CampaignFixture.Dump(a).Split('\n').Count(l => l.StartsWith("baseline|", StringComparison.Ordinal) && (l.Contains("probe.head_power", StringComparison.Ordinal) || l.Contains("shell.surface_temperature", StringComparison.Ordinal))));
    }

    [Fact]
    public async Task An_interrupted_campaign_resumed_equals_an_uninterrupted_one()
    {
        var whole = CampaignFixture.TempDir();
        var cut = CampaignFixture.TempDir();
        Assert.Equal(0, await CampaignFixture.CliAsync("campaign", CampaignFixture.Scenario, "--runs", "5", "--seed", "5", "--versus", CampaignFixture.NoBoost, "--output", whole));
        Assert.Equal(0, await CampaignFixture.CliAsync("campaign", CampaignFixture.Scenario, "--runs", "5", "--seed", "5", "--versus", CampaignFixture.NoBoost, "--output", cut));

        // As a killed process leaves it: some runs committed (each run is one transaction), no summary written.
        foreach (var table in new[] { "runs", "inputs", "criteria", "fault_measures", "rule_firings", "landers", "lander_criteria", "rule_coverage", "procedure_branches" })
        {
            CampaignFixture.Execute(cut, $"DELETE FROM {table} WHERE run_index >= 2 OR (variant = 'no-boost' AND run_index = 1)");
        }

        File.Delete(Path.Combine(cut, "summary.json"));
        Assert.Equal(9, await CampaignFixture.CliAsync("campaign", CampaignFixture.Scenario, "--runs", "5", "--seed", "5", "--versus", CampaignFixture.NoBoost, "--output", cut)); // exists: output refused
        Assert.Equal(0, await CampaignFixture.CliAsync("campaign", CampaignFixture.Scenario, "--runs", "5", "--seed", "5", "--versus", CampaignFixture.NoBoost, "--output", cut, "--resume"));
        Assert.Equal(File.ReadAllText(Path.Combine(whole, "summary.json")), File.ReadAllText(Path.Combine(cut, "summary.json")));
        Assert.Equal(CampaignFixture.Dump(whole), CampaignFixture.Dump(cut));

        // A run stored twice is stored once.
        using var store = CampaignStore.Open(Path.Combine(cut, "campaign.sqlite"));
        Assert.False(store.Add(store.Runs()[0]));
    }

    [Fact]
    public async Task A_regenerated_run_is_byte_identical_to_descent_ops_run_with_its_seed()
    {
        var dir = CampaignFixture.TempDir();
        Assert.Equal(0, await CampaignFixture.CliAsync("campaign", CampaignFixture.Scenario, "--runs", "3", "--seed", "21", "--output", dir));
        var regenerated = Path.Combine(dir, "run2.jsonl");
        Assert.Equal(0, await CampaignFixture.CliAsync("campaign", "log", dir, "--run", "2", "--output", regenerated));
        var direct = Path.Combine(dir, "direct.jsonl");
        var seed = RunSeeds.ForRun(21, 2).ToString(System.Globalization.CultureInfo.InvariantCulture);
        await CampaignFixture.CliAsync("run", CampaignFixture.Scenario, "--seed", seed, "--log", direct, "--kernel", "sequential");
        Assert.Equal(File.ReadAllBytes(direct), File.ReadAllBytes(regenerated));
        Assert.Contains("\"run.inputs_drawn\"", File.ReadAllText(direct), StringComparison.Ordinal);
    }

    [Fact]
    public async Task Removing_the_rescuing_rule_scores_worse_at_200_runs()
    {
        var dir = CampaignFixture.TempDir();
        Assert.Equal(0, await CampaignFixture.CliAsync("campaign", CampaignFixture.Scenario, "--runs", "200", "--seed", "2026", "--versus", CampaignFixture.NoBoost, "--output", dir));
        var summary = Summary(dir);
        var variants = summary["variants"]!.AsArray();
        var pair = summary["pairs"]!.AsArray().Single()!;
        Assert.True(variants[0]!["successes"]!.GetValue<int>() > variants[1]!["successes"]!.GetValue<int>());
        Assert.True(pair["mcnemar_p"]!.GetValue<double>() < 0.01, $"p = {pair["mcnemar_p"]}");
        Assert.True(pair["difference_ci95"]!.AsArray()[0]!.GetValue<double>() > 0);
        Assert.Equal(pair["first_only"]!.GetValue<long>() + pair["second_only"]!.GetValue<long>(), pair["disagreeing_runs"]!.AsArray().Count);
    }

    [Fact]
    public async Task Bad_input_is_refused_before_anything_runs()
    {
        var dir = CampaignFixture.TempDir();
        var (exit, _, stderr) = await CampaignFixture.CliOutputAsync("campaign", CampaignFixture.Scenario, "--runs", "0", "--output", Path.Combine(dir, "a"));
        Assert.Equal(2, exit);
        Assert.Contains("--runs", stderr, StringComparison.Ordinal);
        Assert.False(Directory.Exists(Path.Combine(dir, "a")));

        var change = Path.Combine(dir, "bad-change.yaml");
        File.WriteAllText(change, "remove_faults:\n  - name: no-such-fault\n");
        (exit, _, stderr) = await CampaignFixture.CliOutputAsync("campaign", CampaignFixture.Scenario, "--runs", "2", "--versus", change, "--output", Path.Combine(dir, "b"));
        Assert.Equal(3, exit);
        Assert.Contains("no-such-fault", stderr, StringComparison.Ordinal);
        Assert.Contains("bad-change.yaml", stderr, StringComparison.Ordinal);
        Assert.False(Directory.Exists(Path.Combine(dir, "b")));
    }

    [Theory]
    [InlineData("  - path: shell.thicknes\n    distribution: uniform\n    low: 1 km\n    high: 2 km\n", "uncertain[0].path", "unknown parameter path")]
    [InlineData("  - path: shell.thickness\n    distribution: uniform\n    low: 1\n    high: 2 km\n", "uncertain[0].low", "unit is required")]
    [InlineData("  - path: probe.head_power\n    distribution: normal\n    mean: 6 kW\n    sd: -1 kW\n", "uncertain[0].sd", "must be positive")]
    [InlineData("  - path: shell.thickness\n    distribution: uniform\n    low: 3 km\n    high: 2 km\n", "uncertain[0].low", "below the high end")]
    [InlineData("  - path: faults[no-such].at\n    distribution: uniform\n    low: 1 d\n    high: 2 d\n", "uncertain[0].path", "no item named")]
    [InlineData("  - path: probe.head_power\n    distribution: gamma\n    mean: 6 kW\n    sd: 1 kW\n", "uncertain[0].distribution", "is not one of")]
    [InlineData("  - path: probe.head_power\n    distribution: normal\n    mean: 6 kW\n    sd: 1e300 kW\n", "uncertain[0].sd", "wider than the field's whole valid range")]
    [InlineData("  - path: probe.head_power\n    distribution: normal\n    mean: 1e300 kW\n    sd: 1 kW\n", "uncertain[0].mean", "outside the field's range")]
    [InlineData("  - path: probe.head_power\n    distribution: uniform\n    low: 1 kW\n    high: 1e12 kW\n", "uncertain[0].low", "outside the field's")]
    public void A_bad_uncertain_block_is_refused_with_its_place(string block, string field, string message)
    {
        var text = File.ReadAllText(CampaignFixture.Scenario);
        var start = text.IndexOf("uncertain:\n", StringComparison.Ordinal);
        var end = text.IndexOf("criteria:\n", StringComparison.Ordinal);
        var bad = text[..start] + "uncertain:\n" + block + text[end..];
        var error = Assert.Single(Assert.Throws<ScenarioException>(() => ScenarioLoader.LoadText(bad, "bad.yaml")).Errors);
        Assert.Equal(field, error.FieldPath);
        Assert.Contains(message, error.Message, StringComparison.Ordinal);
        Assert.Equal("bad.yaml", error.Location.File);
        Assert.True(error.Location.Line > text[..start].Count(c => c == '\n'));
    }

    [Theory]
    [InlineData("probe.depht below 3 m", "starts with a run measure")]
    [InlineData("breakthrough below -5 d", "never negative or infinite")]
    [InlineData("frames_lost below 1e400", "")]
    [InlineData("breakthrough sooner 5 d", "comes 'above Q'")]
    [InlineData("final_depth inside 3 km to 1 km", "the lower end comes first")]
    public void A_bad_criterion_is_refused_at_its_line(string requirement, string message)
    {
        var text = File.ReadAllText(CampaignFixture.Scenario);
        var line = text[..text.IndexOf("require: breakthrough below 20 d", StringComparison.Ordinal)].Count(c => c == '\n') + 1;
        var bad = TestScenario.Of(text, "bad.yaml").Replace("require: breakthrough below 20 d", "require: " + requirement).Text;
        var error = Assert.Single(Assert.Throws<ScenarioException>(() => ScenarioLoader.LoadText(bad, "bad.yaml")).Errors);
        Assert.Equal("criteria[0].require", error.FieldPath);
        Assert.Equal("bad.yaml", error.Location.File);
        Assert.Equal(line, error.Location.Line);
        Assert.Contains(message, error.Message, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("--runs", "2000000000", "at most 1000000 runs")]
    [InlineData("--jobs", "100000", "at most 256 workers")]
    public async Task Huge_counts_are_refused_before_anything_runs(string option, string value, string message)
    {
        var dir = Path.Combine(CampaignFixture.TempDir(), "c");
        string[] args = option == "--runs"
            ? ["campaign", CampaignFixture.Scenario, "--runs", value, "--output", dir]
            : ["campaign", CampaignFixture.Scenario, "--runs", "2", option, value, "--output", dir];
        var (exit, _, stderr) = await CampaignFixture.CliOutputAsync(args);
        Assert.Equal(2, exit);
        Assert.Contains(option, stderr, StringComparison.Ordinal);
        Assert.Contains(message, stderr, StringComparison.Ordinal);
        Assert.False(Directory.Exists(dir));
    }

    [Fact]
    public void An_unknown_criterion_measure_is_refused()
    {
        var text = TestScenario.Of(File.ReadAllText(CampaignFixture.Scenario), "bad.yaml").Replace("require: longest_stop below 2 d", "require: longest_nap below 2 d").Text;
        var error = Assert.Single(Assert.Throws<ScenarioException>(() => ScenarioLoader.LoadText(text, "bad.yaml")).Errors);
        Assert.Equal("criteria[1].require", error.FieldPath);
    }

    [Fact]
    public void The_same_seed_draws_the_same_inputs_and_the_draw_is_in_the_runs_scenario()
    {
        var scenario = ScenarioLoader.LoadFile(CampaignFixture.Scenario);
        var (drawn, values) = Mission.Running.UncertainDraw.Draw(scenario, 99);
        var (_, again) = Mission.Running.UncertainDraw.Draw(scenario, 99);
        var (_, other) = Mission.Running.UncertainDraw.Draw(scenario, 100);
        Assert.Equal(values, again);
        Assert.NotEqual(values[0].ValueSi, other[0].ValueSi);
        Assert.Equal(values[0].ValueSi, drawn.Probe.HeadPowerW, 9);
        Assert.Equal(values[1].ValueSi, drawn.Shell.SurfaceTemperatureK, 9);
        Assert.InRange(values[1].ValueSi, 120, 140);
    }

    [Fact]
    public void A_variant_keeps_its_rules_and_faults_when_the_inputs_are_drawn()
    {
        var scenario = ScenarioLoader.LoadFile(CampaignFixture.Scenario);
        var variant = CampaignPlan.ApplyVariant(scenario, new CampaignVariant("no-boost", File.ReadAllText(CampaignFixture.NoBoost)));
        var (drawn, _) = Mission.Running.UncertainDraw.Draw(variant, 3);
        Assert.DoesNotContain("frozen-in-boost-wall", drawn.Rules.Text, StringComparison.Ordinal);
        Assert.Equal(variant.Faults.Select(f => f.Name), drawn.Faults.Select(f => f.Name));
    }
}
