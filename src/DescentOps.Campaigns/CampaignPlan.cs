using DescentOps.Records;
using DescentOps.Journal;
using DescentOps.Scenarios.Loading;
using DescentOps.Scenarios.Model;

namespace DescentOps.Campaigns;

/// <summary>
/// What a campaign runs: the scenario, its variants, the campaign seed, the time limit and the tool that writes the
/// manifests. Every variant's scenario is built (and every change checked) when the plan is made, so a variant file that
/// does not apply is refused before any run.
/// </summary>
public sealed class CampaignPlan
{
    /// <summary>Manifest fields that carry a variant's change, so a regenerated log can be replayed.</summary>
    public const string VariantNameField = "campaign_variant";
    public const string VariantChangeField = "campaign_variant_change_text";

    private readonly Dictionary<string, Scenario> _scenarios = new(StringComparer.Ordinal);

    public CampaignPlan(Scenario scenario, IReadOnlyList<CampaignVariant> variants, long seed, double untilS, string toolVersion, string randomAlgorithm)
    {
        Scenario = scenario;
        Variants = variants;
        Seed = seed;
        UntilS = untilS;
        ToolVersion = toolVersion;
        RandomAlgorithm = randomAlgorithm;
        foreach (var variant in variants)
        {
            if (_scenarios.ContainsKey(variant.Name))
            {
                throw new ScenarioException([new ScenarioError(new SourceLocation(variant.SourcePath ?? variant.Name, 1, 1), "--versus", $"two variants are named '{variant.Name}'; rename a file")]);
            }

            _scenarios[variant.Name] = ApplyVariant(scenario, variant);
            Mission.Autonomy.MissionRules.Compile(_scenarios[variant.Name]);
        }
    }

    public Scenario Scenario { get; }
    public IReadOnlyList<CampaignVariant> Variants { get; }
    public long Seed { get; }
    public double UntilS { get; }
    public string ToolVersion { get; }
    public string RandomAlgorithm { get; }

    public Scenario ScenarioOf(string variant) => _scenarios[variant];

    public RunSpec Spec(string variant, int index) => new(variant, index, RunSeeds.ForRun(Seed, index));

    /// <summary>The manifest <c>descentops run</c> writes for the baseline with this seed; a variant adds its change.</summary>
    public RunManifest ManifestFor(string variant, long seed)
    {
        var manifest = new RunManifest(ToolVersion, Scenario.Name, Scenario.SourceText, seed, UntilS, RandomAlgorithm);
        var change = Variants.First(v => v.Name == variant).ChangeText;
        return change is null ? manifest : manifest with { Extra = [RecordField.Of(VariantNameField, variant), RecordField.Of(VariantChangeField, change)] };
    }

    /// <summary>The scenario a variant runs: the change applied, as <c>branch --with</c> would.</summary>
    public static Scenario ApplyVariant(Scenario scenario, CampaignVariant variant) =>
        variant.ChangeText is null ? scenario : ScenarioLoader.LoadChange(variant.ChangeText, variant.SourcePath ?? variant.Name).ApplyTo(scenario);
}
