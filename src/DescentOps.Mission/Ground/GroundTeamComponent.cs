using DescentOps.Engine.Components;
using DescentOps.Records;
using DescentOps.Mission.Autonomy;
using DescentOps.Mission.Messages;
using DescentOps.Mission.Station;
using DescentOps.Primitives.Time;
using DescentOps.Rules.Compiled;
using DescentOps.Rules.Syntax;
using DescentOps.Scenarios.Model;
using DescentOps.Records.Kinds;

namespace DescentOps.Mission.Ground;

/// <summary>
/// The ground team's view of the mission: it knows only what the frames tell it, late by the tether, the station
/// and the light time; it notices when frame numbers jump; its rules' commands go back up the same way, a light
/// time to the station and then down the fibre, and can arrive too late.
/// </summary>
public sealed class GroundTeamComponent : SimComponent<GroundState>
{
    private readonly RuleHost _rules;
    private readonly SimDuration _uplink;

    public GroundTeamComponent(Scenario scenario, CompiledRuleSet rules)
        : base(MissionIds.Ground, FailurePolicy.RestartFromLastState)
    {
        _rules = new RuleHost(rules, Placement.Ground);
        _uplink = SimDuration.FromSeconds(scenario.Body.DistanceToGroundM / StationComponent.SpeedOfLightMPerS);
    }

    public override GroundState InitialState => new(0, 0, 0, 0.0, null);

    public override GroundState Handle(GroundState state, object message, ComponentContext context)
    {
        _rules.RestoreTo(state.RulesVersion);
        switch (message)
        {
            case RunStarted:
                return state;
            case TelemetryFrame frame:
                var next = Receive(state, frame, context);
                return next with { PendingWake = Uplink(_rules.OnFrame(frame, context), state.PendingWake, context), RulesVersion = _rules.Version };
            case RulesWake:
                return state with { PendingWake = Uplink(_rules.OnWake(context), null, context), RulesVersion = _rules.Version };
            default:
                throw new InvalidOperationException($"The ground team cannot handle {message.GetType().Name}.");
        }
    }

    private static GroundState Receive(GroundState state, TelemetryFrame frame, ComponentContext context)
    {
        var latency = (context.Now - frame.SampledAt).TotalSeconds;
        var missing = Math.Max(0, frame.Sequence - state.LastFrame - 1);
        if (missing > 0)
        {
            context.Record(GroundRecords.Gap, Severity.Warning,
                RecordField.Of("after_frame", state.LastFrame),
                RecordField.Of("missing", missing));
        }

        context.Record(GroundRecords.Telemetry, Severity.Debug,
            RecordField.Of("frame", frame.Sequence),
            RecordField.Of("latency_s", latency),
            RecordField.Of("depth_m", frame.Reading("probe.depth") ?? double.NaN),
            RecordField.Of("regime", frame.Regime));
        return state with
        {
            FramesReceived = state.FramesReceived + 1,
            LastFrame = Math.Max(state.LastFrame, frame.Sequence),
            FramesMissing = state.FramesMissing + missing,
            LastLatencyS = latency,
        };
    }

    private Engine.Scheduling.EventHandle? Uplink(IReadOnlyList<Telecommand> commands, Engine.Scheduling.EventHandle? pendingWake, ComponentContext context)
    {
        foreach (var command in commands)
        {
            context.Schedule(MissionIds.Station, _uplink, command, MissionPriority.Command);
        }

        return _rules.Rearm(pendingWake, context, RulesWake.Instance);
    }
}
