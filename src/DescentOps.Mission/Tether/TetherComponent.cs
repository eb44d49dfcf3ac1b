using DescentOps.Engine.Components;
using DescentOps.Mission.Messages;
using DescentOps.Scenarios.Model;

namespace DescentOps.Mission.Tether;

/// <summary>
/// The link from the probe to the surface. The fibre pays out as the probe descends (it freezes into the borehole
/// behind it, so paid-out length equals depth), carries each frame up after the light's travel time while its optical
/// budget closes, and parts when the spool runs out, jams, or a fault breaks it (<see cref="TetherFibre"/>). Radio
/// relays dropped into the melt channel (<see cref="RelayDrops"/>) form a backup chain to a receiver at the surface;
/// while the fibre is down, frames cross every hop that closes and wait in the probe's or a relay's buffer below one
/// that does not (<see cref="TetherRouting"/>, <see cref="RelaySettling"/>). Every frame that cannot be kept is logged
/// as <c>data.lost</c>. This class only dispatches messages to those parts.
/// </summary>
public sealed class TetherComponent : SimComponent<TetherState>
{
    public TetherComponent(Scenario scenario, LanderIds? ids = null)
        : base((ids ?? LanderIds.Single).Tether, FailurePolicy.RestartFromLastState)
    {
        Design = new TetherDesign(scenario, ids ?? LanderIds.Single);
    }

    public TetherDesign Design { get; }

    public override TetherState InitialState => new(
        0.0, false, null, 0, 0, 0, true,
        new FrameHold<TelemetryFrame>(Design.Tether.BufferFrames), new FrameHold<Telecommand>(Design.Tether.BufferFrames),
        [], 0, [], null, 0, 0, 0.0, 0.0);

    public override TetherState Handle(TetherState state, object message, ComponentContext context)
    {
        var d = Design;
        return message switch
        {
            RunStarted => TetherFibre.Start(d, state, context),
            TelemetryFrame frame => TetherReports.Report(d, OnFrame(state, frame, context), context),
            Telecommand command => TetherReports.Report(d, TetherRouting.CarryDown(d, state, command, context), context),
            DropRelay drop => Settled(RelayDrops.Drop(d, state, drop.DepthM, drop.Origin, context), context),
            RelayBatteryDue due => Settled(RelayDrops.BatteryFlat(state, due.Number, context), context),
            FaultStarted { Fault.Effect: FaultEffect.TetherBreak } fault => Settled(TetherFibre.Break(state, $"fault '{fault.Fault.Name}'", context), context),
            FaultStarted { Fault.Effect: FaultEffect.SpoolJam } fault => Settled(TetherFibre.Break(state, $"spool jam (fault '{fault.Fault.Name}')", context), context),
            FaultStarted { Fault.Effect: FaultEffect.RelayFailure relay } fault => Settled(RelayDrops.Fault(state, fault.Fault.Name, relay.RelayNumber, true, context), context),
            FaultCleared { Fault.Effect: FaultEffect.RelayFailure relay } fault => Settled(RelayDrops.Fault(state, fault.Fault.Name, relay.RelayNumber, false, context), context),
            _ => throw new InvalidOperationException($"The tether cannot handle {message.GetType().Name}."),
        };
    }

    /// <summary>A frame from the probe: the fibre pays out to its depth, relays due there go, then the frame is routed.</summary>
    private TetherState OnFrame(TetherState state, TelemetryFrame frame, ComponentContext context)
    {
        var d = Design;
        var paidOut = TetherFibre.PayOut(d, state, frame.PaidOutM, context) with { ProbeDepthM = frame.PaidOutM, FramesProduced = state.FramesProduced + 1 };
        return TetherRouting.Route(d, TetherFibre.Budget(d, RelayDrops.DropPlanned(d, paidOut, context), context), frame, context);
    }

    /// <summary>After a change in the link: whatever can move now moves, and the probe hears of its buffer and path.</summary>
    private TetherState Settled(TetherState state, ComponentContext context) =>
        TetherReports.Report(Design, TetherRouting.Route(Design, state, null, context), context);
}
