namespace DescentOps.Physics.Shell;

/// <summary>A depth interval of the shell with its bulk salinity (g of salt per kg of ice).</summary>
public sealed record IceLayer(double TopDepthM, double BottomDepthM, double SalinityGPerKg);
