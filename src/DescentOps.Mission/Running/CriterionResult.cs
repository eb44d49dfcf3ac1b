using DescentOps.Scenarios.Campaign;

namespace DescentOps.Mission.Running;

/// <summary>One criterion judged on a finished run: the measured value (null when it does not exist) and the verdict.</summary>
public sealed record CriterionResult(string Name, string Requirement, double? Value, bool Passed)
{
    public static IReadOnlyList<CriterionResult> Judge(IReadOnlyList<MissionCriterion> criteria, MissionSummary summary) =>
        [.. criteria.Select(c =>
        {
            var value = MeasureOf(c.Measure, summary);
            return new CriterionResult(c.Name, c.Requirement, value, c.IsMetBy(value));
        })];

    /// <summary>The value of a run measure (see <see cref="CriterionMeasure.All"/>).</summary>
    public static double? MeasureOf(string measure, MissionSummary s) => measure switch
    {
        "breakthrough" => s.BreakthroughTimeS,
        "final_depth" => s.FinalDepthM,
        "energy_used" => s.EnergyUsedJ,
        "frames_lost" => s.FramesLost,
        "frames_held" => s.FramesHeldMax,
        "time_stopped" => s.TimeStoppedS,
        "longest_stop" => s.LongestStopS,
        "time_frozen" => s.TimeFrozenS,
        "time_blind" => s.TimeBlindS,
        "vehicles_lost" => s.VehiclesLost,
        "faults_unrecovered" => s.Faults.Count(f => f.HasRecoveryMeasure && f.RecoveredAfterS is null),
        _ => throw new ArgumentOutOfRangeException(nameof(measure), measure, "not a run measure"),
    };
}
