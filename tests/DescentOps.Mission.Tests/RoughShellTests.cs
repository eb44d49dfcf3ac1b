using DescentOps.Engine.Running;
using DescentOps.Scenarios;
using DescentOps.Scenarios.Loading;

namespace DescentOps.Mission.Tests;

/// <summary>
/// The rough-shell contingency: a structured shell, a fault that starts on a condition, random bus sags and a noisy tilt
/// sensor. The steering rules keep the probe inside its tilt limit; without them the same faults lose it.
/// </summary>
public sealed class RoughShellTests
{
    private static string Text => BuiltInScenarios.Text("rough-shell.yaml");

    [Fact]
    public async Task Steering_rules_bring_the_probe_through_and_without_them_the_same_faults_lose_it()
    {
        var (scenario, steered, sink, _) = await SharedRuns.OfBuiltInAsync("rough-shell.yaml");
        var (unsteered, sinkWithout) = await MissionHarness.RunAsync(ScenarioLoader.LoadText(MissionHarness.WithoutRules(Text), "without.yaml"));

        Assert.Equal(RunOutcomeKind.Completed, steered.Outcome.Kind);
        Assert.NotNull(steered.BreakthroughTimeS);
        var maxTiltRad = sink.OfKind("probe.telemetry").Max(r => Math.Abs(CollectingSink.Field(r, "tilt_rad")));
        Assert.True(maxTiltRad < scenario.Probe.MaxTiltRad, "the steered probe stays inside its limit on every frame");
        Assert.NotEmpty(sink.OfKind("rule.fired"));

        Assert.Equal(RunOutcomeKind.MissionLost, unsteered.Outcome.Kind);
        Assert.Single(sinkWithout.OfKind("probe.tilt_limit"));
    }

    [Fact]
    public async Task The_shells_structure_and_the_triggers_show_in_the_log()
    {
        var scenario = ScenarioLoader.LoadText(Text, "rough-shell.yaml");
        var (_, sink) = await MissionHarness.RunAsync(scenario);

        // Both debris bands are crossed; the deposit is φ·dz / (1 − 0.4) summed (computed: 20 m × 0.004 + 50 m × 0.001).
        var crossings = sink.OfKind("probe.debris_band_crossed").ToList();
        Assert.Equal(2, crossings.Count);
        Assert.Equal(((20 * 0.004) + (50 * 0.001)) / 0.6, CollectingSink.Field(crossings[^1], "debris_on_head_m"), 9);

        // The segment fails one hour after the first true frame in ice above 250 K.
        var firstWarm = sink.OfKind("probe.telemetry").First(r => CollectingSink.Field(r, "ice_temperature_k") > 250);
        var triggered = Assert.Single(sink.OfKind("fault.triggered"));
        Assert.Equal(firstWarm.Time.SecondsSinceEpoch + 3600, triggered.Time.SecondsSinceEpoch);

        // Three random sags, drawn at the start, each injected at its drawn time.
        var drawn = CollectingSink.NumbersField(Assert.Single(sink.OfKind("fault.drawn")), "starts_s");
        var sags = sink.OfKind("fault.injected").Where(r => CollectingSink.TextField(r, "fault") == "random-bus-sag")
            .Select(r => r.Time.SecondsSinceEpoch).ToList();
        Assert.Equal(3, drawn.Count);
        Assert.Equal(drawn, sags);
    }
}
