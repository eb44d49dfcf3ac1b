namespace DescentOps.Mission.Messages;

/// <summary>A lander's station has failed: the shared link loses what it held for it and frees its share.</summary>
public sealed record StationDown(string Lander);
