namespace DescentOps.Physics.Links;

/// <summary>One-way propagation delay along the tether: light travels at c over the group index.</summary>
public static class FibreLatency
{
    /// <summary>Group index of G.652 fibre at 1310 nm, about 1.4676 (typical datasheet value, from memory).</summary>
    public const double GroupIndex1310Nm = 1.4676;

    /// <summary>Group index of G.652 fibre at 1550 nm, about 1.4682 (typical datasheet value, from memory).</summary>
    public const double GroupIndex1550Nm = 1.4682;

    private const double SpeedOfLightMPerS = PhysicalConstants.SpeedOfLightMPerS;
    private const string Model = "the fibre group delay";

    /// <summary>Delay L·n_g/c.</summary>
    public static double OneWayDelayS(double lengthM, double groupIndex)
    {
        ValidRange.RequireNonNegative(lengthM, nameof(lengthM), "m", Model);
        ValidRange.Require(groupIndex, 1.0, 2.0, nameof(groupIndex), "(group index)", Model);
        return lengthM * groupIndex / SpeedOfLightMPerS;
    }
}
