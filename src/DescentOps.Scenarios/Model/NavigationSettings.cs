namespace DescentOps.Scenarios.Model;

/// <summary>Dead-reckoning error growth between acoustic fixes: a share of the distance run and a random-walk rate.</summary>
public sealed record NavigationSettings(double ErrorPerDistance, double RandomWalkM2PerS);
