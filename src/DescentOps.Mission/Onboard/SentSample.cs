using DescentOps.Primitives.Time;

namespace DescentOps.Mission.Onboard;

/// <summary>The last sample of a point the rules were given: when, and its value (a number, or the regime's name).</summary>
public sealed record SentSample(SimTime At, double Value, string? State);
