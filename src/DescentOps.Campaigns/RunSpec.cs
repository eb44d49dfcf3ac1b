namespace DescentOps.Campaigns;

/// <summary>One run of a campaign: which variant, which index, and the seed every variant's run of that index shares.</summary>
public sealed record RunSpec(string Variant, int Index, long Seed);
