namespace DescentOps.Campaigns;

/// <summary>
/// One rule set or fault set a campaign tries: the scenario as it is (<see cref="BaselineName"/>), or the scenario with a
/// change file applied (the format <c>branch --with</c> takes), named after the file.
/// </summary>
/// <param name="Name">The variant's name: baseline, or the change file's name without its extension.</param>
/// <param name="ChangeText">The change file's text (none for the baseline).</param>
/// <param name="SourcePath">The change file as given on the command line, named in its errors (the name when unknown).</param>
public sealed record CampaignVariant(string Name, string? ChangeText, string? SourcePath = null)
{
    public const string BaselineName = "baseline";

    public static CampaignVariant Baseline { get; } = new(BaselineName, null);
}
