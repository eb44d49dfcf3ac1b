using DescentOps.Engine.Components;
using DescentOps.Engine.Journaling;
using DescentOps.Mission.Messages;
using DescentOps.Primitives.Time;
using DescentOps.Scenarios.Model;

namespace DescentOps.Mission.Tether;

/// <summary>
/// The fibre from the probe to the surface. It pays out as the probe descends (the fibre freezes into the
/// borehole behind it, so paid-out length equals depth), carries each frame up after the light's travel
/// time along the fibre, and parts when the spool runs out or a fault breaks it.
/// </summary>
public sealed class TetherComponent : SimComponent<TetherState>
{
    private const int MilestonesPerSpool = 10;
    private readonly TetherModel _tether;

    public TetherComponent(Scenario scenario)
        : base(MissionIds.Tether, FailurePolicy.RestartFromLastState)
    {
        _tether = scenario.Tether;
    }

    public override TetherState InitialState => new(0.0, false, null, 0, 0, 0);

    public override TetherState Handle(TetherState state, object message, ComponentContext context) => message switch
    {
        RunStarted => state,
        TelemetryFrame frame => Carry(PayOut(state, frame.PaidOutM, context), frame, context),
        Telecommand command => CarryDown(state, command, context),
        FaultStarted { Fault.Kind: FaultKind.TetherBreak } fault => Break(state, $"fault '{fault.Fault.Name}'", context),
        _ => throw new InvalidOperationException($"The tether cannot handle {message.GetType().Name}."),
    };

    private TetherState PayOut(TetherState state, double depthM, ComponentContext context)
    {
        if (state.Broken || depthM <= state.PaidOutM) return state;
        if (depthM > _tether.LengthM)
        {
            return Break(state with { PaidOutM = _tether.LengthM }, "the spool ran out of fibre", context);
        }

        var milestone = (int)(depthM / _tether.LengthM * MilestonesPerSpool);
        if (milestone > state.PayoutMilestone)
        {
            context.Record("tether.payout", Severity.Info,
                RecordField.Of("paid_out_m", depthM),
                RecordField.Of("spool_left_m", _tether.LengthM - depthM));
        }

        return state with { PaidOutM = depthM, PayoutMilestone = Math.Max(milestone, state.PayoutMilestone) };
    }

    private TetherState Carry(TetherState state, TelemetryFrame frame, ComponentContext context)
    {
        if (state.Broken)
        {
            context.Record("tether.frame_lost", Severity.Warning,
                RecordField.Of("frame", frame.Sequence),
                RecordField.Of("broken_at_m", state.BrokenAtDepthM ?? 0.0));
            return state with { FramesLost = state.FramesLost + 1 };
        }

        var delay = SimDuration.FromSeconds(state.PaidOutM / _tether.SignalSpeedMPerS);
        context.Schedule(MissionIds.Station, delay, frame, MissionPriority.Telemetry);
        return state with { FramesCarried = state.FramesCarried + 1 };
    }

    /// <summary>A telecommand from the station goes down the fibre to the probe, or is lost at the break.</summary>
    private TetherState CarryDown(TetherState state, Telecommand command, ComponentContext context)
    {
        if (state.Broken)
        {
            context.Record("command.lost", Severity.Alarm,
                RecordField.Of("command", command.Command.ToString()),
                RecordField.Of("origin", command.Origin),
                RecordField.Of("where", "tether broken"));
            return state;
        }

        context.Schedule(MissionIds.Probe, SimDuration.FromSeconds(state.PaidOutM / _tether.SignalSpeedMPerS), command, MissionPriority.Command);
        return state;
    }

    private static TetherState Break(TetherState state, string cause, ComponentContext context)
    {
        if (state.Broken) return state;
        context.Record("tether.broken", Severity.Alarm,
            RecordField.Of("cause", cause),
            RecordField.Of("paid_out_m", state.PaidOutM),
            RecordField.Of("frames_carried", state.FramesCarried));
        return state with { Broken = true, BrokenAtDepthM = state.PaidOutM };
    }
}
