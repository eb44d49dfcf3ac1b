namespace DescentOps.Scenarios.Model;

/// <summary>
/// One fault. It starts at <see cref="AtS"/> or when the probe's head reaches <see cref="AtDepthM"/> (exactly one of
/// the two is set). <see cref="DurationS"/> is null for a fault that stays; <see cref="RemainingFraction"/> is what a
/// power dip leaves of the heater power; sensor faults name their <see cref="Point"/> and, in SI, their
/// <see cref="ValueSi"/> (the stuck reading or the bias); a relay failure names its relay by <see cref="RelayNumber"/>
/// (1 is the first dropped, nearest the surface).
/// </summary>
public sealed record FaultModel(
    string Name,
    FaultKind Kind,
    double? AtS,
    double? AtDepthM,
    double? DurationS,
    double RemainingFraction,
    string? Point = null,
    double? ValueSi = null,
    double? AngleRad = null,
    int? RelayNumber = null);
