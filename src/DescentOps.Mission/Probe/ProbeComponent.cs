using DescentOps.Engine.Components;
using DescentOps.Engine.Journaling;
using DescentOps.Engine.Running;
using DescentOps.Mission.Messages;
using DescentOps.Physics.Descent;
using DescentOps.Primitives.Time;
using DescentOps.Scenarios.Model;

namespace DescentOps.Mission.Probe;

/// <summary>
/// The descending probe. Between events it melts at a constant rate set by the energy balance at its
/// depth; a telemetry frame goes up the tether every interval, and the crossing into the ocean is an event
/// at the exact instant the depth reaches the shell's thickness, not at the next sample.
/// </summary>
public sealed class ProbeComponent : SimComponent<ProbeState>
{
    private readonly Scenario _scenario;
    private readonly ShellThermalProfile _shell;
    private readonly SimDuration _frameInterval;

    public ProbeComponent(Scenario scenario)
        : base(MissionIds.Probe, FailurePolicy.AbortRun)
    {
        _scenario = scenario;
        _shell = new ShellThermalProfile(scenario.Shell, scenario.Body.GravityMPerS2);
        _frameInterval = SimDuration.FromSeconds(scenario.Probe.TelemetryIntervalS);
    }

    public override ProbeState InitialState => new(
        ProbeRegime.Melting, SimTime.Epoch, 0.0, 0.0, 1.0, 0.0, 0, SimTime.Epoch, null, null, 0, 0);

    public override ProbeState Handle(ProbeState state, object message, ComponentContext context)
    {
        switch (message)
        {
            case RunStarted:
                context.Record("probe.started", Severity.Info,
                    RecordField.Of("shell_thickness_m", _scenario.Shell.ThicknessM),
                    RecordField.Of("base_temperature_k", _shell.BaseTemperatureK),
                    RecordField.Of("head_power_w", _scenario.Probe.HeadPowerW));
                return Replan(Retune(state, context), context);

            case ProbeStepDue:
                return Step(Advance(state with { PendingStep = null }, context.Now), context);

            case FaultStarted { Fault.Kind: FaultKind.PowerDip } dip:
                return Replan(Retune(Advance(state, context.Now) with { PowerFraction = dip.Fault.RemainingFraction }, context), context);

            case FaultCleared { Fault.Kind: FaultKind.PowerDip }:
                return Replan(Retune(Advance(state, context.Now) with { PowerFraction = 1.0 }, context), context);

            case VehicleFinished finished:
                return OnVehicleFinished(state, finished, context);

            default:
                throw new InvalidOperationException($"The probe cannot handle {message.GetType().Name}.");
        }
    }

    private ProbeState Step(ProbeState state, ComponentContext context)
    {
        if (state.Regime != ProbeRegime.AtOcean && state.DepthM >= _scenario.Shell.ThicknessM)
        {
            state = Breakthrough(state, context);
        }

        if (context.Now >= state.NextFrameAt)
        {
            state = SendFrame(state, context);
        }

        return Replan(Retune(state, context), context);
    }

    /// <summary>Moves the state to <paramref name="now"/> under the velocity and power that held since the last update.</summary>
    private ProbeState Advance(ProbeState state, SimTime now)
    {
        var seconds = (now - state.LastUpdate).TotalSeconds;
        var depth = Math.Min(state.DepthM + (state.VelocityMPerS * seconds), _scenario.Shell.ThicknessM);
        return state with
        {
            LastUpdate = now,
            DepthM = depth,
            EnergyUsedJ = state.EnergyUsedJ + (BusPowerW(state) * seconds),
        };
    }

    /// <summary>Sets the velocity for the depth and power now in force, and logs a change of regime.</summary>
    private ProbeState Retune(ProbeState state, ComponentContext context)
    {
        if (state.Regime == ProbeRegime.AtOcean) return state with { VelocityMPerS = 0.0 };

        var velocity = IdealMeltRate.VelocityMPerS(
            HeadPowerW(state),
            _scenario.Probe.RadiusM,
            _shell.TemperatureAtK(state.DepthM),
            _shell.MeltingTemperatureAtK(state.DepthM),
            _scenario.Probe.HeadEfficiency);
        var regime = velocity > 0 ? ProbeRegime.Melting : ProbeRegime.Stopped;
        if (regime != state.Regime)
        {
            context.Record("probe.regime", regime == ProbeRegime.Stopped ? Severity.Warning : Severity.Notice,
                RecordField.Of("from", state.Regime.ToString()),
                RecordField.Of("to", regime.ToString()),
                RecordField.Of("depth_m", state.DepthM));
        }

        return state with { Regime = regime, VelocityMPerS = velocity };
    }

    /// <summary>Replaces the pending timer by one at the next frame or the crossing, whichever comes first.</summary>
    private ProbeState Replan(ProbeState state, ComponentContext context)
    {
        if (state.PendingStep is { } pending) context.Cancel(pending);

        var next = state.NextFrameAt;
        if (state.Regime == ProbeRegime.Melting)
        {
            var remaining = _scenario.Shell.ThicknessM - state.DepthM;
            // Rounded up to the next tick so the step lands on or just past the interface, never just short of it.
            var crossing = context.Now + new SimDuration((long)Math.Ceiling(Math.Min(remaining / state.VelocityMPerS, 1e12) * SimDuration.TicksPerSecond));
            if (crossing < next) next = SimTime.Max(crossing, context.Now);
        }

        var handle = context.ScheduleSelf(next - context.Now, ProbeStepDue.Instance, MissionPriority.Physics);
        return state with { PendingStep = handle };
    }

    private ProbeState SendFrame(ProbeState state, ComponentContext context)
    {
        var frame = new TelemetryFrame(
            state.FramesSent + 1,
            context.Now,
            state.Regime.ToString(),
            state.DepthM,
            state.VelocityMPerS,
            _shell.TemperatureAtK(state.DepthM),
            HeadPowerW(state),
            state.EnergyUsedJ,
            state.VehiclesActive);
        context.Record("probe.telemetry", Severity.Debug,
            RecordField.Of("frame", frame.Sequence),
            RecordField.Of("regime", frame.Regime),
            RecordField.Of("depth_m", frame.DepthM),
            RecordField.Of("velocity_m_s", frame.VelocityMPerS),
            RecordField.Of("ice_temperature_k", frame.IceTemperatureK),
            RecordField.Of("head_power_w", frame.HeadPowerW),
            RecordField.Of("energy_used_j", frame.EnergyUsedJ));
        context.Schedule(MissionIds.Tether, SimDuration.Zero, frame, MissionPriority.Telemetry);
        return state with { FramesSent = frame.Sequence, NextFrameAt = context.Now + _frameInterval };
    }

    private ProbeState Breakthrough(ProbeState state, ComponentContext context)
    {
        context.Record("probe.breakthrough", Severity.Notice,
            RecordField.Of("depth_m", state.DepthM),
            RecordField.Of("energy_used_j", state.EnergyUsedJ),
            RecordField.Of("vehicles", _scenario.Vehicles.Count));
        foreach (var vehicle in _scenario.Vehicles)
        {
            context.Schedule(MissionIds.Vehicle(vehicle.Name), SimDuration.Zero, new ReleaseVehicle(state.DepthM), MissionPriority.Command);
        }

        if (_scenario.Vehicles.Count == 0)
        {
            context.StopRun(RunOutcomeKind.Completed, "the probe reached the ocean; no vehicles to release");
        }

        return state with
        {
            Regime = ProbeRegime.AtOcean,
            BreakthroughAt = context.Now,
            VehiclesActive = _scenario.Vehicles.Count,
            NextFrameAt = context.Now,
        };
    }

    private ProbeState OnVehicleFinished(ProbeState state, VehicleFinished finished, ComponentContext context)
    {
        var next = Advance(state, context.Now) with
        {
            VehiclesActive = state.VehiclesActive - 1,
            VehiclesFinished = state.VehiclesFinished + 1,
        };
        if (next.VehiclesFinished == _scenario.Vehicles.Count)
        {
            context.Record("probe.mission_complete", Severity.Notice,
                RecordField.Of("vehicles_finished", next.VehiclesFinished),
                RecordField.Of("energy_used_j", next.EnergyUsedJ));
            context.StopRun(RunOutcomeKind.Completed, $"all {next.VehiclesFinished} vehicles finished their tasks");
        }

        return next;
    }

    private double HeadPowerW(ProbeState state) =>
        state.Regime == ProbeRegime.AtOcean ? 0.0 : _scenario.Probe.HeadPowerW * state.PowerFraction;

    private double BusPowerW(ProbeState state) =>
        HeadPowerW(state) + (state.Regime == ProbeRegime.AtOcean ? 0.0 : _scenario.Probe.WallPowerW * state.PowerFraction)
        + _scenario.Probe.ElectronicsPowerW;
}
