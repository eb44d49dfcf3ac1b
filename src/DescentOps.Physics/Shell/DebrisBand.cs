namespace DescentOps.Physics.Shell;

/// <summary>A depth interval holding debris (dust, tephra, basal sediment) as a volume fraction of the ice.</summary>
public sealed record DebrisBand(double TopDepthM, double BottomDepthM, double DebrisVolumeFraction);
