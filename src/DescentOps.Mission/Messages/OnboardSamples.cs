using DescentOps.Primitives.Time;

namespace DescentOps.Mission.Messages;

/// <summary>
/// Readings the probe's on-board software took for its rules at one instant, apart from any frame: what the sensors
/// report (a faulty sensor lies on every sample). Never journaled one by one; a rule's firing carries what it saw.
/// </summary>
public sealed record OnboardSamples(SimTime SampledAt, IReadOnlyList<OnboardReading> Readings);
