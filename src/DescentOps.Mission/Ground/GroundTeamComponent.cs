using DescentOps.Engine.Components;
using DescentOps.Engine.Journaling;
using DescentOps.Mission.Messages;

namespace DescentOps.Mission.Ground;

/// <summary>
/// The ground team's view of the mission: it knows only what the frames tell it, late by the tether, the
/// station and the light time, and it notices when frame numbers jump.
/// </summary>
public sealed class GroundTeamComponent : SimComponent<GroundState>
{
    public GroundTeamComponent()
        : base(MissionIds.Ground, FailurePolicy.RestartFromLastState)
    {
    }

    public override GroundState InitialState => new(0, 0, 0, 0.0);

    public override GroundState Handle(GroundState state, object message, ComponentContext context)
    {
        switch (message)
        {
            case RunStarted:
                return state;
            case TelemetryFrame frame:
                var latency = (context.Now - frame.SampledAt).TotalSeconds;
                var missing = Math.Max(0, frame.Sequence - state.LastFrame - 1);
                if (missing > 0)
                {
                    context.Record("ground.gap", Severity.Warning,
                        RecordField.Of("after_frame", state.LastFrame),
                        RecordField.Of("missing", missing));
                }

                context.Record("ground.telemetry", Severity.Debug,
                    RecordField.Of("frame", frame.Sequence),
                    RecordField.Of("latency_s", latency),
                    RecordField.Of("depth_m", frame.DepthM),
                    RecordField.Of("regime", frame.Regime));
                return new GroundState(state.FramesReceived + 1, Math.Max(state.LastFrame, frame.Sequence), state.FramesMissing + missing, latency);
            default:
                throw new InvalidOperationException($"The ground team cannot handle {message.GetType().Name}.");
        }
    }
}
