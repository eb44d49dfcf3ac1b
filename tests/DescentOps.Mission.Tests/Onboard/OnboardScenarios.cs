using DescentOps.Scenarios.Model;
using DescentOps.Tests.Shared;

namespace DescentOps.Mission.Tests.Onboard;

/// <summary>The default scenario cut to 60 days with one depth rule, on board or on the ground, and optional extra faults.</summary>
internal static class OnboardScenarios
{
    public const string Fault = """
          - name: bus-sag-day-30
            kind: power_dip
            at: 30 d
            duration: 12 h
            remaining_fraction: 0.7
        """;

    public static Scenario DepthRule(string placement, string? sampling, string extraFaults = "")
    {
        var rules = $$"""
            rules: |
              {{(placement == "board" ? "autonomy E3" : "# no autonomy level needed on the ground")}}
              rule deep {
                runs on {{placement}}
                severity low
                when probe.depth above 1000 m
                then { send probe.wall set_power(power = 2 kW) }
              }

            """;
        // Each edit must find its text in the default scenario: an edit that misses would silently run another scenario.
        foreach (var expected in new[] { "until: 400 d", "faults:\n", Fault })
        {
            if (!MissionHarness.DefaultText.Contains(expected, StringComparison.Ordinal))
            {
                throw new InvalidOperationException($"the default scenario no longer contains: {expected}");
            }
        }

        return TestScenario.Of(MissionHarness.DefaultText, "onboard.yaml")
            .Set("run.until", "60 d")
            .InsertBefore("\nfaults:\n", "\n" + ((sampling ?? "") + rules).TrimEnd('\n'))
            .Replace(Fault, extraFaults.Length == 0 ? Fault : Fault + "\n" + extraFaults.TrimEnd())
            .Load();
    }
}
