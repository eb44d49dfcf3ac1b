namespace DescentOps.Scenarios.Model;

/// <summary>
/// One scheduled fault. <see cref="DurationS"/> is null for a fault that stays; <see cref="RemainingFraction"/>
/// is what a power dip leaves of the heater power.
/// </summary>
public sealed record FaultModel(string Name, FaultKind Kind, double AtS, double? DurationS, double RemainingFraction);
