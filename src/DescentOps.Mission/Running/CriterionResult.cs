using DescentOps.Scenarios.Campaign;

namespace DescentOps.Mission.Running;

/// <summary>One criterion judged on a finished run: the measured value (null when it does not exist) and the verdict.</summary>
public sealed record CriterionResult(string Name, string Requirement, double? Value, bool Passed)
{
    /// <summary>
    /// The run's verdicts. A criterion of the whole run is measured on the run's figures; one naming a lander on that
    /// lander's; one asked of every lander (or any) passes when every lander (or at least one) meets it, and its value is
    /// left empty, since each lander has its own (see <see cref="JudgeLander"/>).
    /// </summary>
    public static IReadOnlyList<CriterionResult> Judge(IReadOnlyList<MissionCriterion> criteria, MissionSummary summary) =>
        [.. criteria.Select(c =>
        {
            switch (c.Scope)
            {
                case CriterionScope.Lander:
                    var value = summary.Landers.FirstOrDefault(l => l.Lander == c.Lander) is { } lander ? MeasureOf(c.Measure, lander) : null;
                    return new CriterionResult(c.Name, c.Requirement, value, c.IsMetBy(value));
                case CriterionScope.EveryLander:
                    return new CriterionResult(c.Name, c.Requirement, null, summary.Landers.All(l => c.IsMetBy(MeasureOf(c.Measure, l))));
                case CriterionScope.AnyLander:
                    return new CriterionResult(c.Name, c.Requirement, null, summary.Landers.Any(l => c.IsMetBy(MeasureOf(c.Measure, l))));
                default:
                    var runValue = MeasureOf(c.Measure, summary);
                    return new CriterionResult(c.Name, c.Requirement, runValue, c.IsMetBy(runValue));
            }
        })];

    /// <summary>The criteria judged on one lander's figures: those naming it and those asked of every or any lander.</summary>
    public static IReadOnlyList<CriterionResult> JudgeLander(IReadOnlyList<MissionCriterion> criteria, LanderSummary lander) =>
        [.. criteria.Where(c => c.Concerns(lander.Lander)).Select(c =>
        {
            var value = MeasureOf(c.Measure, lander);
            return new CriterionResult(c.Name, c.Requirement, value, c.IsMetBy(value));
        })];

    /// <summary>The value of a run measure (see <see cref="CriterionMeasure.All"/>).</summary>
    public static double? MeasureOf(string measure, IRunFigures s) => measure switch
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
        "faults_unrecovered" => s.FaultsUnrecovered,
        _ => throw new ArgumentOutOfRangeException(nameof(measure), measure, "not a run measure"),
    };
}
