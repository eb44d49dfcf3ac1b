using DescentOps.Engine.Components;
using DescentOps.Mission.Messages;
using DescentOps.Primitives.Time;
using DescentOps.Scenarios.Model;

namespace DescentOps.Mission.Station;

/// <summary>
/// The surface station: it passes each frame from the tether home after its own handling delay plus the one-way light
/// time, and passes commands from home down the fibre (<see cref="StationRelay"/>). With the scenario's optional parts
/// it also takes a dose and dies at the failure dose drawn at the start, resets after discharge upsets
/// (<see cref="StationLife"/>), sends only while home is up, frames and commands waiting in its queues for the next
/// window at the link's data rate (<see cref="StationTransmitter"/>), and holds the probe on the surface for a
/// sterilising dwell (<see cref="StationDwell"/>). Without them it relays at once, as a plain relay, and fails only by
/// a fault. This class only dispatches messages to those parts.
/// </summary>
public sealed class StationComponent : SimComponent<StationState>
{
    /// <summary>Speed of light in vacuum, m/s (exact by the SI definition of the metre).</summary>
    public const double SpeedOfLightMPerS = Physics.PhysicalConstants.SpeedOfLightMPerS;

    /// <param name="scenario">The mission.</param>
    /// <param name="ids">The lander's ids; a single lander's by default.</param>
    /// <param name="reportsCarrier">Whether the ground hears of the carrier's changes (<see cref="StationBeacon"/>).</param>
    public StationComponent(Scenario scenario, LanderIds? ids = null, bool reportsCarrier = false)
        : base((ids ?? LanderIds.Single).Station, FailurePolicy.RestartFromLastState)
    {
        Design = new StationDesign(scenario, ids ?? LanderIds.Single, reportsCarrier);
    }

    public StationDesign Design { get; }

    public double OneWayLightTimeS => Design.OneWayLightTimeS;

    /// <summary>The station's dose model, or null when the scenario gives no radiation.</summary>
    public StationDose? Dose => Design.Dose;

    public HomeLink Link => Design.SiteLink;

    public override StationState InitialState => new(false, 0, 0, null, null, [], 0, [], 0, null, SimTime.Epoch, null, 0, 0);

    public override StationState Handle(StationState state, object message, ComponentContext context)
    {
        var after = HandleMessage(state, message, context);
        StationBeacon.Report(Design, state, after, context);
        return after;
    }

    private StationState HandleMessage(StationState state, object message, ComponentContext context)
    {
        var d = Design;
        switch (message)
        {
            case RunStarted:
                StationStart.Start(d, context);
                return state;
            case TelemetryFrame frame:
                return StationRelay.OnFrame(d, state, frame, context);
            case Telecommand command:
                return StationRelay.OnCommand(d, state, command, context);
            case LinkService:
                return StationTransmitter.Pump(d, StationTransmitter.Serve(d, state with { PendingService = null }, context), context);
            case StationDoseLimit limit:
                return StationLife.DieOfDose(d, state, limit, context);
            case StationUpset:
                StationLife.ScheduleNextUpset(d, context);
                return StationLife.Upset(d, state, d.Station.Charging!.RecoveryTimeS, "discharge", context);
            case FaultStarted { Fault.Effect: FaultEffect.StationUpset } fault:
                return StationLife.Upset(d, state, fault.Fault.DurationS!.Value, $"fault '{fault.Fault.Name}'", context);
            case FaultCleared { Fault.Effect: FaultEffect.StationUpset }:
                return state;
            case StationUpsetOver over:
                return StationLife.RecoverFromUpset(d, state, over, context);
            case DwellOver:
                StationDwell.End(d, context);
                return state;
            case FaultStarted { Fault.Effect: FaultEffect.StationFailure } fault:
                return StationLife.FailByFault(d, state, fault.Fault.Name, context);
            case FaultCleared { Fault.Effect: FaultEffect.StationFailure } fault:
                return StationLife.RecoverFromFault(d, state, fault.Fault.Name, context);
            default:
                throw new InvalidOperationException($"The station cannot handle {message.GetType().Name}.");
        }
    }
}
