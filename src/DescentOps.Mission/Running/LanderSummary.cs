namespace DescentOps.Mission.Running;

/// <summary>
/// One lander's figures of a run, from the records of its own components (and the shared link's records that name it):
/// the summary's figures measured on this lander alone, whether its probe ever froze in and whether its station was dead
/// at the end, the criteria judged on it, and its success (the run completed and it met every criterion judged on it).
/// </summary>
public sealed record LanderSummary(
    string Lander,
    double? BreakthroughTimeS,
    double FinalDepthM,
    double EnergyUsedJ,
    long FramesSent,
    long FramesReceivedOnGround,
    long FramesLost,
    long FramesHeldMax,
    double TimeStoppedS,
    double LongestStopS,
    double TimeFrozenS,
    double TimeBlindS,
    int VehiclesLost,
    int FaultsUnrecovered,
    bool Stalled,
    bool StationDead) : IRunFigures
{
    /// <summary>The criteria judged on this lander's figures (those naming it, and those asked of every or any lander).</summary>
    public IReadOnlyList<CriterionResult> Criteria { get; init; } = [];

    public bool Success { get; init; }

    /// <summary>The probe reached the ocean.</summary>
    public bool ReachedOcean => BreakthroughTimeS is not null;
}
