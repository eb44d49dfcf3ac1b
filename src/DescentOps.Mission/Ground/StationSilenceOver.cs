namespace DescentOps.Mission.Ground;

/// <summary>The ground has heard nothing from its station, with home in view, for the silence timeout.</summary>
public sealed record StationSilenceOver
{
    public static StationSilenceOver Instance { get; } = new();
}
