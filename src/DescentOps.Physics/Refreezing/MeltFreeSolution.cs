namespace DescentOps.Physics.Refreezing;

/// <summary>Energy and time a frozen-in probe's wall heaters need to re-melt the refrozen gap.</summary>
public sealed record MeltFreeSolution(double EnergyJ, double TimeS);
