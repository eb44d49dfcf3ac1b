namespace DescentOps.Campaigns;

/// <summary>
/// One rule set or fault set a campaign tries: the scenario as it is (<see cref="BaselineName"/>), or the scenario with a
/// change file applied (the format <c>branch --with</c> takes), named after the file.
/// </summary>
public sealed record CampaignVariant(string Name, string? ChangeText)
{
    public const string BaselineName = "baseline";

    public static CampaignVariant Baseline { get; } = new(BaselineName, null);
}
