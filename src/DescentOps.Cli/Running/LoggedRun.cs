using DescentOps.Journal;
using DescentOps.Scenarios.Loading;
using DescentOps.Scenarios.Model;

namespace DescentOps.Cli.Running;

/// <summary>
/// A log opened for re-running: integrity checked first (an edited log is refused; a truncated one is
/// accepted for its intact prefix), then its manifest and the scenario it carries.
/// </summary>
public sealed record LoggedRun(string Path, RunManifest Manifest, Scenario Scenario, VerificationReport Integrity)
{
    public bool IsTruncated => Integrity.Failure == VerificationFailure.TruncatedTail;

    /// <summary>Whole lines that can be trusted: all of them, or those before the cut.</summary>
    public long IntactLines => IsTruncated ? Math.Max(0, (Integrity.FirstBadLine ?? 1) - 1) : Integrity.LinesChecked;

    public static LoggedRun Open(string path)
    {
        if (!File.Exists(path)) throw new FileNotFoundException($"no such log: {path}", path);
        var integrity = JournalVerifier.Verify(path);
        if (!integrity.Ok && integrity.Failure != VerificationFailure.TruncatedTail)
        {
            throw new LogIntegrityException($"{path}:{integrity.FirstBadLine}: {integrity.Failure}: {integrity.Detail} Refusing to re-run a log that fails verification.");
        }

        using var reader = JournalReader.Open(path);
        if (!reader.TryRead(out var first) || first is not ManifestEntry manifestEntry)
        {
            throw new LogIntegrityException($"{path}: the log has no manifest line.");
        }

        var manifest = manifestEntry.Manifest;
        var scenario = ScenarioLoader.LoadText(manifest.ScenarioText, $"{path}#manifest");
        foreach (var branch in BranchInfo.All(manifest))
        {
            scenario = ScenarioLoader.LoadChange(branch.ChangeText, $"{path}#branch-{branch.Generation}").ApplyTo(scenario);
        }

        // A campaign variant's log carries its change, as a branch does.
        if (manifest.Extra.FirstOrDefault(f => f.Name == DescentOps.Campaigns.CampaignPlan.VariantChangeField).Text is { } variantChange)
        {
            scenario = ScenarioLoader.LoadChange(variantChange, $"{path}#variant").ApplyTo(scenario);
        }

        return new LoggedRun(path, manifest, scenario, integrity);
    }
}
