namespace DescentOps.Mission.Running;

/// <summary>
/// The figures a mission criterion can measure (see <c>CriterionMeasure.All</c>), shared by a run's summary and by
/// each lander's, so that one reading serves both.
/// </summary>
public interface IRunFigures
{
    double? BreakthroughTimeS { get; }

    double FinalDepthM { get; }

    double EnergyUsedJ { get; }

    long FramesLost { get; }

    long FramesHeldMax { get; }

    double TimeStoppedS { get; }

    double LongestStopS { get; }

    double TimeFrozenS { get; }

    double TimeBlindS { get; }

    int VehiclesLost { get; }

    /// <summary>Faults with a recovery measure that had not recovered at the end.</summary>
    int FaultsUnrecovered { get; }
}
