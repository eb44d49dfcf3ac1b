namespace DescentOps.Mission.Messages;

/// <summary>
/// One reading: a number, or the regime's name in <see cref="State"/>. <see cref="AtCrossing"/> says the instant is a
/// limit crossing found by root finding on the physics, not a sample on the sensor's grid.
/// </summary>
public sealed record OnboardReading(string Point, double Value, string? State, bool AtCrossing);
