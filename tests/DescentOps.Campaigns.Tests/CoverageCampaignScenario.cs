using DescentOps.Tests.Shared;

namespace DescentOps.Campaigns.Tests;

/// <summary>
/// The built-in ground-frees-stalled-probe made a campaign (shared by the campaign and the cluster tests): four days, the
/// bus trip's length and depth drawn (so the probe freezes in, and the rule starts the procedure, in some runs only) and
/// the first step's time limit drawn between 30 min and 3 h (so it is late in some runs and the procedure falls back to
/// safe mode).
/// </summary>
public static class CoverageCampaignScenario
{
    public static string Text => TestScenario.BuiltIn("ground-frees-stalled-probe.yaml")
        .Set("run.until", "4 d")
        .AddSection("""
            uncertain:
              - path: faults[bus-trip-day-1].duration
                distribution: uniform
                low: 5 min
                high: 3 h
              - path: faults[bus-trip-day-1].remaining_fraction
                distribution: uniform
                low: 0
                high: 0.6
              - path: procedures[free-frozen-probe].steps[boost-wall].within
                distribution: uniform
                low: 30 min
                high: 3 h
            """).Text;

    /// <summary>The scenario written into a fresh folder; its path.</summary>
    public static string File()
    {
        var path = Path.Combine(TestFolders.New(), "coverage-campaign.yaml");
        System.IO.File.WriteAllText(path, Text);
        return path;
    }
}
