using DescentOps.Engine.Journaling;
using DescentOps.Engine.Running;

namespace DescentOps.Mission.Running;

/// <summary>The figures of a finished mission run, derived from its journal records alone.</summary>
public sealed record MissionSummary(
    RunOutcome Outcome,
    double FinalTimeS,
    double? BreakthroughTimeS,
    double FinalDepthM,
    double EnergyUsedJ,
    int FaultsInjected,
    long FramesSent,
    long FramesReceivedOnGround,
    long FramesLost,
    int VehicleProfiles,
    long EventsDelivered,
    long RecordsWritten,
    int ComponentFailures,
    IReadOnlyList<FaultMeasure> Faults)
{
    /// <summary>Total time stopped or frozen in before the ocean, after the probe first moved.</summary>
    public double TimeStoppedS { get; init; }

    public double LongestStopS { get; init; }

    public double TimeFrozenS { get; init; }

    /// <summary>Time the ground received no frame for more than three telemetry intervals.</summary>
    public double TimeBlindS { get; init; }

    /// <summary>The most frames held at once in the link's buffers.</summary>
    public long FramesHeldMax { get; init; }

    public int VehiclesLost { get; init; }

    /// <summary>Firings per rule (rules that never fired are absent).</summary>
    public IReadOnlyDictionary<string, int> RuleFirings { get; init; } = new Dictionary<string, int>();

    /// <summary>Every rule of the run's rule set, in declaration order.</summary>
    public IReadOnlyList<string> RuleNames { get; init; } = [];

    /// <summary>The uncertain inputs this run drew.</summary>
    public IReadOnlyList<DrawnInput> Inputs { get; init; } = [];

    /// <summary>The scenario's criteria judged on this run.</summary>
    public IReadOnlyList<CriterionResult> Criteria { get; init; } = [];

    /// <summary>A run succeeds when it completes and meets every criterion.</summary>
    public bool Success => Outcome.Kind == RunOutcomeKind.Completed && Criteria.All(c => c.Passed);

    /// <summary>The summary's figures as journal fields, in a fixed order.</summary>
    public IReadOnlyList<RecordField> ToFields() =>
    [
        RecordField.Of("breakthrough_t_s", BreakthroughTimeS ?? double.NaN),
        RecordField.Of("final_depth_m", FinalDepthM),
        RecordField.Of("energy_used_j", EnergyUsedJ),
        RecordField.Of("faults_injected", FaultsInjected),
        RecordField.Of("frames_sent", FramesSent),
        RecordField.Of("frames_received_on_ground", FramesReceivedOnGround),
        RecordField.Of("frames_lost", FramesLost),
        RecordField.Of("vehicle_profiles", VehicleProfiles),
        RecordField.Of("events_delivered", EventsDelivered),
        RecordField.Of("records_written", RecordsWritten),
        RecordField.Of("component_failures", ComponentFailures),
        RecordField.Of("time_stopped_s", TimeStoppedS),
        RecordField.Of("longest_stop_s", LongestStopS),
        RecordField.Of("time_frozen_s", TimeFrozenS),
        RecordField.Of("time_blind_s", TimeBlindS),
        RecordField.Of("frames_held_max", FramesHeldMax),
        RecordField.Of("vehicles_lost", VehiclesLost),
        .. Faults.SelectMany(f => new[]
        {
            RecordField.Of($"fault.{f.Fault}.detected_after_s", f.DetectedAfterS ?? double.NaN),
            RecordField.Of($"fault.{f.Fault}.first_action_after_s", f.FirstActionAfterS ?? double.NaN),
            RecordField.Of($"fault.{f.Fault}.recovered_after_s", f.RecoveredAfterS ?? double.NaN),
        }),
        .. Criteria.Select(c => RecordField.Of($"criterion.{c.Name}", c.Passed)),
        .. Criteria.Count > 0 ? new[] { RecordField.Of("success", Success) } : [],
    ];
}
