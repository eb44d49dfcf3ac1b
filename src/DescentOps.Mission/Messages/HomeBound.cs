namespace DescentOps.Mission.Messages;

/// <summary>A frame a lander's station hands to the shared link home, to wait in its store for the lander's turn.</summary>
public sealed record HomeBound(string Lander, TelemetryFrame Frame);
