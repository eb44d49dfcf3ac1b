using DescentOps.Scenarios.Model;

namespace DescentOps.Mission.Probe;

/// <summary>A sensor fault in force (by its name and effect), with the reading a stuck sensor repeats (its value at the fault's start unless given).</summary>
public sealed record ActiveSensorFault(string Name, FaultEffect.SensorFault Effect, double? StuckAtSi);
