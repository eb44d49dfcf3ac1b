using DescentOps.Tests.Shared;

namespace DescentOps.Campaigns.Tests;

/// <summary>
/// The built-in three-lander scenario made a campaign (shared by the campaign and the cluster tests): eight days, Rook's
/// death drawn between 10 h and 8 d (so Brack Hollow's station is dead at the end in some runs), Quillet's bus sag left
/// with 60 % to 100 % of its power (so Fellside Rise's probe freezes in in some runs), and three criteria: one naming
/// Fellside Rise, one asked of every lander (the default) and one of any lander.
/// </summary>
public static class LanderCampaignScenario
{
    public const string FellCriterion = "fell-deep-enough";
    public const double FellDepthM = 120;

    public static string Text => TestScenario.BuiltIn("three-landers-shared-link.yaml")
        .Set("run.until", "8 d")
        .AddSection("""
            uncertain:
              - path: faults[rook-dies].at
                distribution: uniform
                low: 10 h
                high: 8 d
              - path: faults[quillet-bus-sag].remaining_fraction
                distribution: uniform
                low: 0.6
                high: 1.0
            criteria:
              - name: fell-deep-enough
                lander: fell
                require: final_depth above 120 m
              - name: never-frozen
                require: time_frozen below 1 h
              - name: one-deep
                landers: any
                require: final_depth above 140 m
            """).Text;

    /// <summary>The scenario written into a fresh folder; its path.</summary>
    public static string File()
    {
        var path = Path.Combine(TestFolders.New(), "three-landers-campaign.yaml");
        System.IO.File.WriteAllText(path, Text);
        return path;
    }
}
