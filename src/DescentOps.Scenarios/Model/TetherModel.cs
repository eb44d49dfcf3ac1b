namespace DescentOps.Scenarios.Model;

/// <summary>The fibre tether spooled on the probe: length available and the speed light travels in it.</summary>
public sealed record TetherModel(double LengthM, double SignalSpeedMPerS);
