using System.Text.Json.Serialization;

namespace DescentOps.Mission.Running;

/// <summary>
/// What one fault did to a run, in seconds after it began: when a rule first noticed (detection), when a command
/// first reached the probe (first action), when the physical state was back within limits (recovery); null for
/// what never happened. <see cref="Recovery"/> says how recovery is judged for this kind of fault.
/// </summary>
public sealed record FaultMeasure(string Fault, string Kind, double StartS, double? DetectedAfterS, double? FirstActionAfterS, double? RecoveredAfterS, string Recovery)
{
    /// <summary>False for faults with no physical recovery to measure (sensor faults); a broken fibre has one, and never meets it.</summary>
    public bool HasRecoveryMeasure { get; init; } = true;

    /// <summary>A fault with a physical recovery to measure that had not recovered when the run ended (derived, so not sent on the wire).</summary>
    [JsonIgnore]
    public bool Unrecovered => HasRecoveryMeasure && RecoveredAfterS is null;
}
