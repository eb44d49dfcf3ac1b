using DescentOps.Engine.Components;
using DescentOps.Engine.Journaling;
using DescentOps.Mission.Messages;
using DescentOps.Primitives.Time;
using DescentOps.Scenarios.Model;

namespace DescentOps.Mission.Station;

/// <summary>
/// The surface station: it passes each frame from the tether home after its own handling delay plus the
/// one-way light time to the ground team, and relays nothing once it has failed.
/// </summary>
public sealed class StationComponent : SimComponent<StationState>
{
    /// <summary>Speed of light in vacuum, m/s (exact by the SI definition of the metre).</summary>
    public const double SpeedOfLightMPerS = 299_792_458.0;

    private readonly SimDuration _delayHome;
    private readonly SimDuration _forwarding;

    public StationComponent(Scenario scenario)
        : base(MissionIds.Station, FailurePolicy.RestartFromLastState)
    {
        OneWayLightTimeS = scenario.Body.DistanceToGroundM / SpeedOfLightMPerS;
        _delayHome = SimDuration.FromSeconds(scenario.Station.ForwardingDelayS + OneWayLightTimeS);
        _forwarding = SimDuration.FromSeconds(scenario.Station.ForwardingDelayS);
    }

    public double OneWayLightTimeS { get; }

    public override StationState InitialState => new(false, 0, 0);

    public override StationState Handle(StationState state, object message, ComponentContext context)
    {
        switch (message)
        {
            case RunStarted:
                context.Record("station.started", Severity.Info, RecordField.Of("one_way_light_time_s", OneWayLightTimeS));
                return state;
            case TelemetryFrame frame when state.Failed:
                context.Record("station.frame_lost", Severity.Warning, RecordField.Of("frame", frame.Sequence));
                return state with { FramesLost = state.FramesLost + 1 };
            case TelemetryFrame frame:
                context.Schedule(MissionIds.Ground, _delayHome, frame, MissionPriority.Telemetry);
                return state with { FramesForwarded = state.FramesForwarded + 1 };
            case Telecommand command when state.Failed:
                context.Record("command.lost", Severity.Alarm,
                    RecordField.Of("command", command.Command.ToString()),
                    RecordField.Of("origin", command.Origin),
                    RecordField.Of("where", "station failed"));
                return state;
            case Telecommand command:
                context.Schedule(MissionIds.Tether, _forwarding, command, MissionPriority.Command);
                return state;
            case FaultStarted { Fault.Kind: FaultKind.StationFailure } fault:
                context.Record("station.failed", Severity.Critical,
                    RecordField.Of("fault", fault.Fault.Name),
                    RecordField.Of("frames_forwarded", state.FramesForwarded));
                return state with { Failed = true };
            case FaultCleared { Fault.Kind: FaultKind.StationFailure } fault:
                context.Record("station.recovered", Severity.Notice, RecordField.Of("fault", fault.Fault.Name));
                return state with { Failed = false };
            default:
                throw new InvalidOperationException($"The station cannot handle {message.GetType().Name}.");
        }
    }
}
