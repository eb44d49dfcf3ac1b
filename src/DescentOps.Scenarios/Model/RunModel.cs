namespace DescentOps.Scenarios.Model;

/// <summary>Run settings a scenario proposes; the command line may override them.</summary>
public sealed record RunModel(long Seed, double UntilS);
