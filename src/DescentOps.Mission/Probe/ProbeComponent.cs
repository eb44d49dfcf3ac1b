using System.Collections.Immutable;
using DescentOps.Engine.Components;
using DescentOps.Records;
using DescentOps.Mission.Messages;
using DescentOps.Physics.Descent;
using DescentOps.Physics.Power;
using DescentOps.Primitives.Time;
using DescentOps.Scenarios.Model;
using DescentOps.Records.Kinds;

namespace DescentOps.Mission.Probe;

/// <summary>
/// The descending probe, a thin shell over its parts. Between events it moves at the constant rate the descent model
/// gives for its depth and power (<see cref="ProbeMotion"/>); a telemetry frame goes up the tether every interval
/// (<see cref="ProbeTelemetry"/>); the end of the sublimation zone and the crossing into the ocean are events at the
/// exact instant the depth reaches them (<see cref="ProbeStepPlanner"/>). A probe that stops long enough for its water
/// gap to freeze is held by the ice until its wall heaters melt it free (<see cref="ProbeRegimeMachine"/>). With a
/// power system the heaters get what the bus allocates them (<see cref="ProbeBusControl"/>).
/// </summary>
public sealed class ProbeComponent : SimComponent<ProbeState>
{
    private readonly ProbeDesign _design;

    /// <summary>A probe; given the mission's rules it samples for the on-board ones (<see cref="Onboard.OnboardSamplingPlan"/>), otherwise they see the frames.</summary>
    public ProbeComponent(Scenario scenario, Rules.Compiled.CompiledRuleSet? rules = null, LanderIds? ids = null)
        : base((ids ?? LanderIds.Single).Probe, FailurePolicy.AbortRun)
    {
        _design = new ProbeDesign(scenario) { Onboard = Onboard.OnboardSamplingPlan.For(scenario, rules), Ids = ids ?? LanderIds.Single };
    }

    /// <summary>The descent model this probe runs on (exposed for the physics benchmark and tests).</summary>
    public ProbeDescentModel Descent => _design.Descent;

    public override ProbeState InitialState => new(
        ProbeRegime.Melting, SimTime.Epoch, 0.0, 0.0, 0.0, 1.0, 0.0, 0, SimTime.Epoch, null, null, false, null, null, 0, 0,
        _design.Probe.HeadPowerW, _design.Probe.WallPowerW, false, [], [], ImmutableSortedDictionary<string, double>.Empty.WithComparers(StringComparer.Ordinal), 0.0, 0.0, 0.0, 0.0,
        _design.Power is not { } power ? null : new ProbeBusState(
            power.InitialStateOfCharge,
            PowerBus.Allocate(0.0, 0.0, 0.0, null, []),
            ImmutableSortedSet<string>.Empty.WithComparer(StringComparer.Ordinal),
            BusEnergy.Zero,
            false),
        HeldAtSurface: _design.Scenario.Station.Dwell is not null)
    {
        JetSetpointW = _design.Probe.Jets?.InitialHeatW ?? 0.0,
        JetHoleRadiusM = _design.Probe.Jets?.HoleRadiusM ?? 0.0,
    };

    public override ProbeState Handle(ProbeState state, object message, ComponentContext context)
    {
        if (_design.Onboard is not { } plan) return HandleMessage(state, message, context);
        return message is ProbeSampleDue
            ? Onboard.OnboardSampler.Take(_design, plan, state, context)
            : Onboard.OnboardSampler.Rearm(_design, plan, HandleMessage(state, message, context), context);
    }

    private ProbeState HandleMessage(ProbeState state, object message, ComponentContext context)
    {
        var d = _design;
        switch (message)
        {
            case RunStarted:
                context.Record(ProbeRecords.Started, Severity.Info,
                    RecordField.Of("shell_thickness_m", d.ShellThicknessM),
                    RecordField.Of("base_temperature_k", d.Descent.Shell.BaseTemperatureK),
                    RecordField.Of("base_pressure_pa", d.Descent.Shell.BasePressurePa),
                    RecordField.Of("liquid_onset_depth_m", d.Descent.LiquidOnsetDepthM),
                    RecordField.Of("head_power_w", d.Probe.HeadPowerW),
                    RecordField.Of("wall_power_w", d.Probe.WallPowerW));
                ProbeBusControl.RecordPowerSystem(d, state, context);
                return Settle(state with { Regime = d.Descent.LiquidOnsetDepthM > 0 ? ProbeRegime.Sublimating : ProbeRegime.Melting }, context);

            case ProbeStepDue:
                return Step(Advance(state with { PendingStep = null }, context), context);

            case ProbeThermalDue due:
                return Settle(ProbeRegimeMachine.Thermal(Advance(state with { PendingThermal = null }, context), due, context), context);

            case FaultStarted { Fault.Effect: FaultEffect.PowerDip dip } started:
                return Settle(WithDips(Advance(state, context), state.ActiveDips.SetItem(started.Fault.Name, dip.RemainingFraction)), context);

            case FaultCleared { Fault.Effect: FaultEffect.PowerDip } cleared:
                return Settle(WithDips(Advance(state, context), state.ActiveDips.Remove(cleared.Fault.Name)), context);

            case DescentCleared cleared:
                context.Record(ProbeRecords.DescentStarted, Severity.Notice,
                    RecordField.Of("dwell_s", cleared.DwellS),
                    RecordField.Of("log_reduction", cleared.LogReduction));
                return Settle(Advance(state, context) with { HeldAtSurface = false }, context);

            case LinkBufferFill fill:
                return state with { BufferFill = fill.Fraction };

            case LinkPathChanged path:
                return state with { LinkPath = path.Path };

            case VehicleFinished finished:
                return ProbeMilestones.VehicleFinished(d, Advance(state, context), finished, context);

            case DockLoad dock:
                var demands = dock.PowerW > 0 ? state.DockDemandsW.SetItem(dock.Vehicle, dock.PowerW) : state.DockDemandsW.Remove(dock.Vehicle);
                return Settle(Advance(state, context) with { DockDemandsW = demands }, context);

            case FaultStarted { Fault.Effect: FaultEffect.HeaterSegmentFailure segment }:
                return Settle(Advance(state, context) with { SegmentLossFraction = 1 - segment.RemainingFraction }, context);

            case FaultCleared { Fault.Effect: FaultEffect.HeaterSegmentFailure }:
                return Settle(Advance(state, context) with { SegmentLossFraction = 0.0 }, context);

            case FaultStarted { Fault.Effect: FaultEffect.CloggedNozzle clog } clogged:
                return Settle(ProbeJets.Clog(d, Advance(state, context), clog.RemainingFraction, clogged.Fault.Name, context), context);

            case FaultCleared { Fault.Effect: FaultEffect.CloggedNozzle } cleared:
                return Settle(ProbeJets.Clog(d, Advance(state, context), 1.0, cleared.Fault.Name, context), context);

            case FaultStarted { Fault.Effect: FaultEffect.TiltKick kick }:
                var kicked = Advance(state, context);
                return Replan(ProbeAttitude.CheckTilt(d, kicked with { TiltRad = kicked.TiltRad + kick.AngleRad }, context), context);

            case FaultCleared { Fault.Effect: FaultEffect.TiltKick }:
                return state;

            case Telecommand command when command.Command.Target == MissionIds.Autonomy:
                // A rule set uplinked from the ground: the probe's autonomy loads it.
                context.Schedule(_design.Ids.Autonomy, SimDuration.Zero, command, MissionPriority.Command);
                return state;

            case Telecommand command when command.Command.Target.Name.StartsWith("vehicle-", StringComparison.Ordinal):
                // Commands for a vehicle arrive over the fibre and go on through the probe's acoustic modem.
                context.Schedule(_design.Ids.Of(command.Command.Target), SimDuration.Zero, command, MissionPriority.Command);
                return state;

            case Telecommand command:
                return Settle(ProbeCommands.Execute(d, Advance(state, context), command, context), context);

            case ArmDepthTrigger arm:
                return Replan(state with { DepthTriggers = state.DepthTriggers.Add(new ArmedDepthTrigger(arm.FaultIndex, arm.DepthM)) }, context);

            case FaultStarted { Fault.Effect: FaultEffect.SensorFault sensor } started:
                return ProbeSensors.StartFault(d, Advance(state, context), started.Fault.Name, sensor, context);

            case FaultCleared { Fault.Effect: FaultEffect.SensorFault sensor } cleared:
                return ProbeSensors.EndFault(state, cleared.Fault.Name, sensor, context);

            default:
                throw new InvalidOperationException($"The probe cannot handle {message.GetType().Name}.");
        }
    }

    private ProbeState Advance(ProbeState state, ComponentContext context) => ProbeMotion.Advance(_design, state, context.Now);

    /// <summary>Overlapping dips: the bus delivers the smallest share any dip in force leaves.</summary>
    private static ProbeState WithDips(ProbeState state, ImmutableSortedDictionary<string, double> dips) =>
        state with { ActiveDips = dips, PowerFraction = dips.IsEmpty ? 1.0 : dips.Values.Min() };

    private ProbeState Step(ProbeState state, ComponentContext context)
    {
        foreach (var trigger in state.DepthTriggers.Where(t => state.DepthM >= t.DepthM))
        {
            context.Schedule(_design.Ids.FaultInjector, SimDuration.Zero, new DepthTriggerReached(trigger.FaultIndex, state.DepthM), MissionPriority.Fault);
        }

        state = state with { DepthTriggers = state.DepthTriggers.RemoveAll(t => state.DepthM >= t.DepthM) };
        state = ProbeAttitude.CheckTilt(_design, ProbeAttitude.CrossDebris(_design, state, context), context);
        if (ProbeHeaters.IsMoving(state.Regime) && state.DepthM >= _design.ShellThicknessM)
        {
            state = ProbeMilestones.Breakthrough(_design, state, context);
        }

        if (context.Now >= state.NextFrameAt)
        {
            state = ProbeTelemetry.SendFrame(_design, state, context);
        }

        return Settle(state, context);
    }

    /// <summary>Regime and velocity for the power now in force, then the next step.</summary>
    private ProbeState Settle(ProbeState state, ComponentContext context) =>
        Replan(ProbeRegimeMachine.Retune(_design, state, context), context);

    /// <summary>Replaces the pending step by one at the instant the planner names.</summary>
    private ProbeState Replan(ProbeState state, ComponentContext context)
    {
        if (state.PendingStep is { } pending) context.Cancel(pending);
        var next = ProbeStepPlanner.NextStepAt(_design, state, context.Now);
        var handle = context.ScheduleSelf(next - context.Now, ProbeStepDue.Instance, MissionPriority.Physics);
        return state with { PendingStep = handle };
    }
}
