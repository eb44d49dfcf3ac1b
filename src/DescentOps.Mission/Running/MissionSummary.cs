using DescentOps.Records;
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
    IReadOnlyList<FaultMeasure> Faults) : IRunFigures
{
    /// <summary>Frames sent that the ground has neither received nor lost when the run ends: held in a buffer or queue, or on their way.</summary>
    public long FramesHeldOrInFlight => FramesSent - FramesReceivedOnGround - FramesLost;

    /// <summary>Time the probe spent stopped or frozen in, not descending.</summary>
    public double TimeStoppedS { get; init; }

    /// <summary>The longest single stretch stopped or frozen in.</summary>
    public double LongestStopS { get; init; }

    /// <summary>Time the probe spent frozen in (part of <see cref="TimeStoppedS"/>).</summary>
    public double TimeFrozenS { get; init; }

    /// <summary>Time the ground saw nothing of the probe: see <see cref="GroundBlindness"/>.</summary>
    public double TimeBlindS { get; init; }

    /// <summary>The most frames held at once in the link's buffers.</summary>
    public long FramesHeldMax { get; init; }

    public int VehiclesLost { get; init; }

    /// <inheritdoc />
    public int FaultsUnrecovered => Faults.Count(f => f.Unrecovered);

    /// <summary>Firings per rule (rules that never fired are absent).</summary>
    public IReadOnlyDictionary<string, int> RuleFirings { get; init; } = new Dictionary<string, int>();

    /// <summary>Every rule of the run's rule set, in declaration order.</summary>
    public IReadOnlyList<string> RuleNames { get; init; } = [];

    /// <summary>The uncertain inputs this run drew.</summary>
    public IReadOnlyList<DrawnInput> Inputs { get; init; } = [];

    /// <summary>The scenario's criteria judged on this run.</summary>
    public IReadOnlyList<CriterionResult> Criteria { get; init; } = [];

    /// <summary>Each lander's own figures, in the scenario's order; empty for a scenario without a landers list.</summary>
    public IReadOnlyList<LanderSummary> Landers { get; init; } = [];

    /// <summary>Each rule of the run's rule set with whether it acted (fired, escalated or continued).</summary>
    public IReadOnlyList<RuleCoverage> RulesActed { get; init; } = [];

    /// <summary>Every branch of the run's procedures with how often it was taken.</summary>
    public IReadOnlyList<BranchCoverage> Branches { get; init; } = [];

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
        RecordField.Of("frames_held_or_in_flight", FramesHeldOrInFlight),
        RecordField.Of("time_stopped_s", TimeStoppedS),
        RecordField.Of("longest_stop_s", LongestStopS),
        RecordField.Of("time_frozen_s", TimeFrozenS),
        RecordField.Of("time_blind_s", TimeBlindS),
        RecordField.Of("frames_held_max", FramesHeldMax),
        RecordField.Of("vehicles_lost", VehiclesLost),
        RecordField.Of("vehicle_profiles", VehicleProfiles),
        RecordField.Of("events_delivered", EventsDelivered),
        RecordField.Of("records_written", RecordsWritten),
        RecordField.Of("component_failures", ComponentFailures),
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
