namespace DescentOps.Mission.Station;

/// <summary>The station's transmitter may send what waits: a window is open, the last frame is out, the station is up.</summary>
public sealed record LinkService
{
    public static LinkService Instance { get; } = new();
}
