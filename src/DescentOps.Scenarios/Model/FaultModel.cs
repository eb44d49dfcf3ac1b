using DescentOps.Scenarios.Loading;

namespace DescentOps.Scenarios.Model;

/// <summary>
/// One fault. It starts at <see cref="AtS"/> or when the probe's head reaches <see cref="AtDepthM"/>.
/// <see cref="DurationS"/> is null for a fault that stays; <see cref="RemainingFraction"/> is what a power dip leaves
/// of the heater power; sensor faults name their <see cref="Point"/> and, in SI, their <see cref="ValueSi"/> (the stuck
/// reading, the bias or the noise); a vehicle loss names its <see cref="Vehicle"/> and <see cref="Cause"/>; a relay failure its relay by
/// <see cref="RelayNumber"/> (1 is the first dropped, nearest the surface). Instead of a
/// time or a depth, a fault may start when the condition <see cref="When"/> (rule-language text, located at
/// <see cref="WhenAt"/>) first holds on the probe's true state, or at random after <see cref="NotBeforeS"/>, up to
/// <see cref="Occurrences"/> times.
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
    string? Vehicle = null,
    VehicleLossCause? Cause = null,
    string? When = null,
    SourceLocation? WhenAt = null,
    double? MeanIntervalS = null,
    double NotBeforeS = 0.0,
    int Occurrences = 1,
    int? RelayNumber = null)
{
    /// <summary>True when the fault starts at random (a Poisson process with mean interval <see cref="MeanIntervalS"/>).</summary>
    public bool IsRandom => MeanIntervalS is not null;

    /// <summary>Rules named as meant to detect this fault (<c>detected_by</c>).</summary>
    public IReadOnlyList<string> DetectedBy { get; init; } = [];
}
