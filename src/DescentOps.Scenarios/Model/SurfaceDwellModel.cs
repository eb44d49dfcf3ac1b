namespace DescentOps.Scenarios.Model;

/// <summary>
/// Time the probe waits on the surface before melting starts, so that the radiation sterilises its exposed hardware:
/// each <see cref="DValueGy"/> of dose divides the surviving spores by ten.
/// </summary>
public sealed record SurfaceDwellModel(double DurationS, double DValueGy);
