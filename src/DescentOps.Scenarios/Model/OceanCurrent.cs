namespace DescentOps.Scenarios.Model;

/// <summary>A steady current the vehicle drifts in: speed, and the direction it flows towards (clockwise from north).</summary>
public sealed record OceanCurrent(double SpeedMPerS, double DirectionRad);
