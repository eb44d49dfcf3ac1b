namespace DescentOps.Physics.Power;

/// <summary>Which loads run and which are shed, the power they draw and what is left over.</summary>
public sealed record LoadAllocation(IReadOnlyList<PoweredLoad> Running, IReadOnlyList<PoweredLoad> Shed, double SuppliedPowerW, double SparePowerW);
