namespace DescentOps.Mission.Station;

/// <summary>The surface dwell has lasted its time.</summary>
public sealed record DwellOver
{
    public static DwellOver Instance { get; } = new();
}
