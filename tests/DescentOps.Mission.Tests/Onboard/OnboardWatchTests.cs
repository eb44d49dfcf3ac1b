using DescentOps.Mission.Autonomy;
using DescentOps.Mission.Onboard;
using DescentOps.Scenarios.Loading;
using DescentOps.Tests.Shared;

namespace DescentOps.Mission.Tests.Onboard;

/// <summary>Which points the on-board rules read, their limits, and which checks need every sample.</summary>
public sealed class OnboardWatchTests
{
    [Fact]
    public void Limits_and_states_are_watched_by_side_rates_steps_and_sample_counts_at_every_sample()
    {
        var rules = """
            rules: |
              autonomy E3
              rule a {
                runs on board
                severity low
                when probe.depth above 1000 m and probe.regime is Melting for 10 min
                then { send probe pause_descent }
              }
              rule b {
                runs on board
                severity low
                priority 1
                when probe.tilt outside -2 deg to 3 deg or rate of probe.energy_used over 1 h above 20 kWh/h
                then { send probe resume_descent }
              }
              rule c {
                runs on board
                severity low
                priority 2
                when probe.ice_temperature above 250 K for 3 samples
                then { send probe enter_safe_mode }
              }
              rule d {
                runs on ground
                severity low
                priority 3
                when probe.velocity below 1 m/h
                then { send probe resume_descent }
              }

            """;
        var text = TestScenario.Of(MissionHarness.DefaultText, "w.yaml").InsertBefore("\nfaults:\n", "\n" + rules.TrimEnd('\n')).Text;
        var watch = OnboardWatch.From(MissionRules.Compile(ScenarioLoader.LoadText(text, "w.yaml")));
        Assert.Equal(["probe.depth", "probe.energy_used", "probe.ice_temperature", "probe.regime", "probe.tilt"], watch.Points);
        Assert.Equal([1000.0], watch.Boundaries["probe.depth"].ToArray());
        Assert.Equal([-2 * Math.PI / 180, 3 * Math.PI / 180], watch.Boundaries["probe.tilt"].Select(x => Math.Round(x, 12)), (x, y) => Math.Abs(x - y) < 1e-12);
        Assert.Equal(["probe.energy_used", "probe.ice_temperature"], watch.EverySample);
    }
}
