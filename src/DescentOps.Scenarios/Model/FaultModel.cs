namespace DescentOps.Scenarios.Model;

/// <summary>
/// One fault: a <see cref="Start"/> and an <see cref="Effect"/>, each one of a closed set, and a
/// <see cref="DurationS"/> that is null for a fault that stays.
/// </summary>
public sealed record FaultModel(string Name, FaultStart Start, FaultEffect Effect, double? DurationS)
{
    /// <summary>The effect's name (the scenario file's word, and the kind the logs carry).</summary>
    public FaultKind Kind => Effect.Kind;

    /// <summary>Rules named as meant to detect this fault (<c>detected_by</c>).</summary>
    public IReadOnlyList<string> DetectedBy { get; init; } = [];
}
