namespace DescentOps.Scenarios.Campaign;

/// <summary>
/// A named pass/fail criterion: <see cref="Measure"/> compared with thresholds in SI, in the rule language's words:
/// <c>above</c> and <c>below</c> are strict, <c>inside LOW to HIGH</c> includes its ends.
/// </summary>
public sealed record MissionCriterion(string Name, string Requirement, string Measure, string Comparison, double LowSi, double HighSi)
{
    /// <summary>Whose figures it judges: the run's (a scenario without landers), one lander's, every lander's or any lander's.</summary>
    public CriterionScope Scope { get; init; } = CriterionScope.Run;

    /// <summary>The lander it names when <see cref="Scope"/> is <see cref="CriterionScope.Lander"/>.</summary>
    public string? Lander { get; init; }

    /// <summary>Whether this criterion is judged on the figures of <paramref name="lander"/>.</summary>
    public bool Concerns(string lander) => Scope is CriterionScope.EveryLander or CriterionScope.AnyLander || (Scope == CriterionScope.Lander && Lander == lander);

    /// <summary>Whether a measured value meets the criterion; a value that does not exist (no breakthrough) never does.</summary>
    public bool IsMetBy(double? value) => value is { } v && Comparison switch
    {
        "above" => v > LowSi,
        "below" => v < LowSi,
        "inside" => v >= LowSi && v <= HighSi,
        _ => v < LowSi || v > HighSi,
    };
}
