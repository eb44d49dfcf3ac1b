namespace DescentOps.Mission.Messages;

/// <summary>A lander's frame as it reaches the ground, handed to the mission desk with the lander's name.</summary>
public sealed record LanderFrame(string Lander, TelemetryFrame Frame);
