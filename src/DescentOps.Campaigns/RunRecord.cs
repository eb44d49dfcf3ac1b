using DescentOps.Mission.Running;

namespace DescentOps.Campaigns;

/// <summary>
/// What a campaign keeps of one run: the outcome, the summary figures, the drawn inputs, each criterion, each fault's
/// measures, each rule's firings, and the summary line's chain value (which a regenerated log must end with).
/// Keyed by (variant, index): a result that arrives twice is the same result. A scenario with landers adds each lander's
/// own figures and verdicts (<see cref="Landers"/>); every run says which rules acted and which procedure branches it
/// took (<see cref="RulesActed"/>, <see cref="Branches"/>).
/// </summary>
public sealed record RunRecord(
    string Variant,
    int Index,
    long Seed,
    string Outcome,
    string Reason,
    bool Success,
    double? BreakthroughTimeS,
    double FinalTimeS,
    double FinalDepthM,
    double EnergyUsedJ,
    long FramesLost,
    long FramesHeldMax,
    double TimeStoppedS,
    double LongestStopS,
    double TimeFrozenS,
    double TimeBlindS,
    int VehiclesLost,
    int ComponentFailures,
    string SummaryChain,
    IReadOnlyList<DrawnInput> Inputs,
    IReadOnlyList<CriterionResult> Criteria,
    IReadOnlyList<FaultMeasure> Faults,
    IReadOnlyList<(string Rule, int Firings)> RuleFirings)
{
    /// <summary>Each lander's figures and criteria, in the scenario's order; empty for a scenario without landers.</summary>
    public IReadOnlyList<LanderSummary> Landers { get; init; } = [];

    /// <summary>Each rule of the run's rule set with whether it acted (fired, escalated or continued).</summary>
    public IReadOnlyList<RuleCoverage> RulesActed { get; init; } = [];

    /// <summary>Every branch of the run's procedures with how often the run took it.</summary>
    public IReadOnlyList<BranchCoverage> Branches { get; init; } = [];
}
