namespace DescentOps.Mission.Station;

/// <summary>A discharge upsets the station (the next arrival of the Poisson process).</summary>
public sealed record StationUpset
{
    public static StationUpset Instance { get; } = new();
}
