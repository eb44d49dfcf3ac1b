namespace DescentOps.Cli.Commands.Physics;

/// <summary>Which freeze-in solution <c>physics refreeze</c> reports.</summary>
internal enum RefreezeGeometry
{
    /// <summary>A water gap against a flat cold wall (planar Neumann solution).</summary>
    Planar,

    /// <summary>A water gap around a cylindrical probe (the model the simulated probe uses).</summary>
    Cylinder,
}
