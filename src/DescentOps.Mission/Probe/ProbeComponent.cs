using System.Collections.Immutable;
using DescentOps.Engine.Components;
using DescentOps.Engine.Journaling;
using DescentOps.Engine.Running;
using DescentOps.Mission.Messages;
using DescentOps.Physics.Attitude;
using DescentOps.Physics.Descent;
using DescentOps.Physics.Ice;
using DescentOps.Physics.Power;
using DescentOps.Physics.Refreezing;
using DescentOps.Primitives.Time;
using DescentOps.Scenarios.Model;

namespace DescentOps.Mission.Probe;

/// <summary>
/// The descending probe. Between events it moves at the constant rate the descent model gives for its depth
/// and power; a telemetry frame goes up the tether every interval; the end of the sublimation zone and the
/// crossing into the ocean are events at the exact instant the depth reaches them. A probe that stops long
/// enough for its water gap to freeze is held by the ice until its wall heaters melt it free. With a power system
/// (<see cref="ProbePowerSystem"/>) the heaters get what the bus allocates them, which a power dip, a flat battery or
/// a shed command can take away.
/// </summary>
public sealed class ProbeComponent : SimComponent<ProbeState>
{
    /// <summary>Longest thermal timer worth scheduling, 1e10 s (about 300 years): longer means never within a run.</summary>
    private const double MaxTimerS = 1e10;

    private readonly Scenario _scenario;
    private readonly ProbeDescentModel _descent;
    private readonly SimDuration _frameInterval;
    private readonly bool _watchedByFaults;
    private readonly ProbePowerSystem? _power;

    public ProbeComponent(Scenario scenario)
        : base(MissionIds.Probe, FailurePolicy.AbortRun)
    {
        _scenario = scenario;
        _descent = ProbeDescentFactory.Model(scenario);
        _frameInterval = SimDuration.FromSeconds(scenario.Probe.TelemetryIntervalS);
        _watchedByFaults = Faults.FaultInjectorComponent.WatchesTrueState(scenario);
        _power = scenario.Power is { } power ? new ProbePowerSystem(power, scenario.Probe) : null;
    }

    /// <summary>The descent model this probe runs on (exposed for the physics benchmark and tests).</summary>
    public ProbeDescentModel Descent => _descent;

    public override ProbeState InitialState => new(
        ProbeRegime.Melting, SimTime.Epoch, 0.0, 0.0, 0.0, 1.0, 0.0, 0, SimTime.Epoch, null, null, false, null, null, 0, 0,
        _scenario.Probe.HeadPowerW, _scenario.Probe.WallPowerW, false, [], [], ImmutableSortedDictionary<string, double>.Empty.WithComparers(StringComparer.Ordinal), 0.0, 0.0, 0.0, 0.0,
        _power is null ? null : new ProbeBusState(
            _power.InitialStateOfCharge,
            PowerBus.Allocate(0.0, 0.0, 0.0, null, []),
            ImmutableSortedSet<string>.Empty.WithComparer(StringComparer.Ordinal),
            BusEnergy.Zero,
            false),
        HeldAtSurface: _scenario.Station.Dwell is not null);

    public override ProbeState Handle(ProbeState state, object message, ComponentContext context)
    {
        switch (message)
        {
            case RunStarted:
                context.Record("probe.started", Severity.Info,
                    RecordField.Of("shell_thickness_m", _scenario.Shell.ThicknessM),
                    RecordField.Of("base_temperature_k", _descent.Shell.BaseTemperatureK),
                    RecordField.Of("base_pressure_pa", _descent.Shell.BasePressurePa),
                    RecordField.Of("liquid_onset_depth_m", _descent.LiquidOnsetDepthM),
                    RecordField.Of("head_power_w", _scenario.Probe.HeadPowerW),
                    RecordField.Of("wall_power_w", _scenario.Probe.WallPowerW));
                RecordPowerSystem(state, context);
                var initial = state with { Regime = _descent.LiquidOnsetDepthM > 0 ? ProbeRegime.Sublimating : ProbeRegime.Melting };
                return Replan(Retune(initial, context), context);

            case ProbeStepDue:
                return Step(Advance(state with { PendingStep = null }, context.Now), context);

            case ProbeThermalDue due:
                return Replan(Retune(Thermal(Advance(state with { PendingThermal = null }, context.Now), due, context), context), context);

            case FaultStarted { Fault.Kind: FaultKind.PowerDip } dip:
                return Replan(Retune(WithDips(Advance(state, context.Now), state.ActiveDips.SetItem(dip.Fault.Name, dip.Fault.RemainingFraction)), context), context);

            case FaultCleared { Fault.Kind: FaultKind.PowerDip } cleared:
                return Replan(Retune(WithDips(Advance(state, context.Now), state.ActiveDips.Remove(cleared.Fault.Name)), context), context);

            case DescentCleared cleared:
                context.Record("probe.descent_started", Severity.Notice,
                    RecordField.Of("dwell_s", cleared.DwellS),
                    RecordField.Of("log_reduction", cleared.LogReduction));
                return Replan(Retune(Advance(state, context.Now) with { HeldAtSurface = false }, context), context);

            case LinkBufferFill fill:
                return state with { BufferFill = fill.Fraction };

            case VehicleFinished finished:
                return OnVehicleFinished(state, finished, context);

            case DockLoad dock:
                var demands = dock.PowerW > 0 ? state.DockDemandsW.SetItem(dock.Vehicle, dock.PowerW) : state.DockDemandsW.Remove(dock.Vehicle);
                return Replan(Retune(Advance(state, context.Now) with { DockDemandsW = demands }, context), context);

            case FaultStarted { Fault.Kind: FaultKind.HeaterSegmentFailure } segment:
                return Replan(Retune(Advance(state, context.Now) with { SegmentLossFraction = 1 - segment.Fault.RemainingFraction }, context), context);

            case FaultCleared { Fault.Kind: FaultKind.HeaterSegmentFailure }:
                return Replan(Retune(Advance(state, context.Now) with { SegmentLossFraction = 0.0 }, context), context);

            case FaultStarted { Fault.Kind: FaultKind.TiltKick } kick:
                var kicked = Advance(state, context.Now);
                return Replan(CheckTilt(kicked with { TiltRad = kicked.TiltRad + kick.Fault.AngleRad!.Value }, context), context);

            case FaultCleared { Fault.Kind: FaultKind.TiltKick }:
                return state;

            case Telecommand command when command.Command.Target.Name.StartsWith("vehicle-", StringComparison.Ordinal):
                // Commands for a vehicle arrive over the fibre and go on through the probe's acoustic modem.
                context.Schedule(command.Command.Target, SimDuration.Zero, command, MissionPriority.Command);
                return state;

            case Telecommand command:
                return Replan(Retune(Execute(Advance(state, context.Now), command, context), context), context);

            case ArmDepthTrigger arm:
                return Replan(state with { DepthTriggers = state.DepthTriggers.Add(new ArmedDepthTrigger(arm.FaultIndex, arm.DepthM)) }, context);

            case FaultStarted { Fault.Kind: FaultKind.SensorStuck or FaultKind.SensorBias or FaultKind.SensorDropout or FaultKind.SensorNoise } sensor:
                return StartSensorFault(Advance(state, context.Now), sensor.Fault, context);

            case FaultCleared { Fault.Kind: FaultKind.SensorStuck or FaultKind.SensorBias or FaultKind.SensorDropout or FaultKind.SensorNoise } sensor:
                context.Record("probe.sensor_restored", Severity.Notice, RecordField.Of("fault", sensor.Fault.Name), RecordField.Of("point", sensor.Fault.Point ?? ""));
                return state with { SensorFaults = state.SensorFaults.RemoveAll(f => f.Fault.Name == sensor.Fault.Name) };

            default:
                throw new InvalidOperationException($"The probe cannot handle {message.GetType().Name}.");
        }
    }

    /// <summary>
    /// Carries out a telecommand. Set points are what the heaters are asked for; a power dip still scales what they
    /// get. Safe mode stops the head and runs the wall heaters at their maximum to keep the water gap open.
    /// </summary>
    private ProbeState Execute(ProbeState state, Telecommand command, ComponentContext context)
    {
        var action = command.Command;
        double Power() => action.Arguments.Single(a => a.Name == "power").ValueSi!.Value;
        string Load() => action.Arguments.Single(a => a.Name == "load").Word!;
        var next = (action.Target.Name, action.Command) switch
        {
            (Autonomy.MissionCatalogue.Head, "set_power") => state with { HeadSetpointW = Math.Min(Power(), _scenario.Probe.MaxHeadPowerW) },
            (Autonomy.MissionCatalogue.Wall, "set_power") => state with { WallSetpointW = Math.Min(Power(), _scenario.Probe.MaxWallPowerW) },
            ("probe", "steer") => state with { SteeringW = Math.Clamp(action.Arguments.Single(a => a.Name == "power_difference").ValueSi!.Value, -_scenario.Probe.MaxHeadPowerW / 2, _scenario.Probe.MaxHeadPowerW / 2) },
            ("probe", "pause_descent") => state with { Paused = true },
            ("probe", "resume_descent") => state with { Paused = false },
            ("probe", "enter_safe_mode") => state with { Paused = true, WallSetpointW = _scenario.Probe.MaxWallPowerW },
            (Autonomy.MissionCatalogue.Bus, "shed_load") when state.Bus is { } bus => state with { Bus = bus with { SwitchedOff = bus.SwitchedOff.Add(Load()) } },
            (Autonomy.MissionCatalogue.Bus, "restore_load") when state.Bus is { } bus => state with { Bus = bus with { SwitchedOff = bus.SwitchedOff.Remove(Load()) } },
            ("probe", "drop_relay") => LetRelayGo(state, command, context),
            _ => throw new InvalidOperationException($"The probe has no command {action}."),
        };
        context.Record("command.executed", Severity.Notice,
            RecordField.Of("command", action.ToString()),
            RecordField.Of("origin", command.Origin),
            RecordField.Of("placement", command.Placement),
            RecordField.Of("issued_t_s", command.IssuedAt.SecondsSinceEpoch),
            RecordField.Of("latency_s", (context.Now - command.IssuedAt).TotalSeconds),
            RecordField.Of("head_setpoint_w", next.HeadSetpointW),
            RecordField.Of("wall_setpoint_w", next.WallSetpointW),
            RecordField.Of("paused", next.Paused));
        return next;
    }

    /// <summary>A relay leaves the probe at its head depth; the link takes it from there.</summary>
    private static ProbeState LetRelayGo(ProbeState state, Telecommand command, ComponentContext context)
    {
        context.Schedule(MissionIds.Tether, SimDuration.Zero, new DropRelay(state.DepthM, command.Origin), MissionPriority.Command);
        return state;
    }

    /// <summary>Beyond the scenario's tilt limit the probe is lost: the run ends as MissionLost.</summary>
    private ProbeState CheckTilt(ProbeState state, ComponentContext context)
    {
        if (Math.Abs(state.TiltRad) <= _scenario.Probe.MaxTiltRad || state.Regime == ProbeRegime.AtOcean) return state;
        context.Record("probe.tilt_limit", Severity.Critical,
            RecordField.Of("tilt_rad", state.TiltRad),
            RecordField.Of("limit_rad", _scenario.Probe.MaxTiltRad),
            RecordField.Of("depth_m", state.DepthM),
            RecordField.Of("lateral_drift_m", state.LateralDriftM));
        context.StopRun(RunOutcomeKind.MissionLost, string.Create(System.Globalization.CultureInfo.InvariantCulture, $"tilt {state.TiltRad * 180 / Math.PI:F1} deg beyond the {_scenario.Probe.MaxTiltRad * 180 / Math.PI:F1} deg limit"));
        return state with { VelocityMPerS = 0.0 };
    }

    /// <summary>
    /// Accounts for the debris bands melted through since the last step: the deposit on the head grows, and the tilt takes
    /// one normal draw with the variance the bands give over that depth (a random walk in depth, so the step length does
    /// not matter). The probe draws only when a band scatters, so shells without such bands keep their random streams.
    /// </summary>
    private ProbeState CrossDebris(ProbeState state, ComponentContext context)
    {
        if (state.DepthM <= state.DebrisAccountedToM) return state;
        var crossing = DebrisCrossing.Between(_scenario.Shell.DebrisBands, state.DebrisAccountedToM, state.DepthM);
        state = state with { DebrisAccountedToM = state.DepthM, DebrisOnHeadM = state.DebrisOnHeadM + crossing.DebrisM };
        if (crossing.TiltVarianceRad2 > 0)
        {
            state = state with { TiltRad = state.TiltRad + context.Random.NextNormal(0.0, Math.Sqrt(crossing.TiltVarianceRad2)) };
        }

        foreach (var band in crossing.BandsLeft)
        {
            context.Record("probe.debris_band_crossed", Severity.Notice,
                RecordField.Of("top_m", band.TopM),
                RecordField.Of("bottom_m", band.BottomM),
                RecordField.Of("debris_on_head_m", state.DebrisOnHeadM),
                RecordField.Of("tilt_rad", state.TiltRad));
        }

        return state;
    }

    /// <summary>Overlapping dips: the bus delivers the smallest share any dip in force leaves.</summary>
    private static ProbeState WithDips(ProbeState state, ImmutableSortedDictionary<string, double> dips) =>
        state with { ActiveDips = dips, PowerFraction = dips.IsEmpty ? 1.0 : dips.Values.Min() };

    private ProbeState StartSensorFault(ProbeState state, FaultModel fault, ComponentContext context)
    {
        var truth = TrueReadings(state).First(r => r.Point == fault.Point).Value;
        var stuckAt = fault.Kind == FaultKind.SensorStuck ? fault.ValueSi ?? truth : (double?)null;
        context.Record("probe.sensor_fault", Severity.Warning,
            RecordField.Of("fault", fault.Name),
            RecordField.Of("point", fault.Point ?? ""),
            RecordField.Of("mode", fault.Kind.ToString()),
            RecordField.Of("true_value", truth));
        return state with { SensorFaults = state.SensorFaults.Add(new ActiveSensorFault(fault, stuckAt)) };
    }

    private ProbeState Step(ProbeState state, ComponentContext context)
    {
        foreach (var trigger in state.DepthTriggers.Where(t => state.DepthM >= t.DepthM))
        {
            context.Schedule(MissionIds.FaultInjector, SimDuration.Zero, new DepthTriggerReached(trigger.FaultIndex, state.DepthM), MissionPriority.Fault);
        }

        state = state with { DepthTriggers = state.DepthTriggers.RemoveAll(t => state.DepthM >= t.DepthM) };
        state = CheckTilt(CrossDebris(state, context), context);

        if (IsMoving(state.Regime) && state.DepthM >= _scenario.Shell.ThicknessM)
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
        var bus = state.Bus;
        var busEnergyJ = 0.0;
        if (bus is not null)
        {
            var step = PowerBus.Advance(bus.Allocation, bus.StateOfCharge, _power!.Battery, seconds);
            busEnergyJ = step.Energy.LoadsJ;
            bus = bus with
            {
                StateOfCharge = step.StateOfCharge,
                Energy = bus.Energy.Plus(step.Energy),
                BatteryLockedOut = step.StateOfCharge <= 0 || (bus.BatteryLockedOut && step.StateOfCharge < ProbePowerSystem.ReconnectStateOfCharge),
            };
        }

        var depth = Math.Min(state.DepthM + (state.VelocityMPerS * Math.Cos(state.TiltRad) * seconds), _scenario.Shell.ThicknessM);
        return state with
        {
            LastUpdate = now,
            DepthM = depth,
            LateralDriftM = state.LateralDriftM + (state.VelocityMPerS * Math.Sin(state.TiltRad) * seconds),
            TiltRad = state.TiltRad + (TiltRateRadPerS(state) * seconds),
            EnergyUsedJ = state.EnergyUsedJ + (bus is null ? BusPowerW(state) * seconds : busEnergyJ),
            Bus = bus,
        };
    }

    /// <summary>
    /// dθ/dt from <see cref="TiltDynamics"/> (MODEL): the head's power difference turns it, a pendulum-stabilised body
    /// relaxes towards the vertical with τ = ℓ/v, and the body cannot turn faster than its clearance allows. Held over
    /// one step (explicit Euler): over a 10-minute step the tilt changes by thousandths of a degree. A failed
    /// segment turns the probe towards positive tilt; steering power on the other half turns it back.
    /// </summary>
    private double TiltRateRadPerS(ProbeState state)
    {
        var v = state.VelocityMPerS;
        if (v <= 0 || !IsMoving(state.Regime)) return 0.0;
        var rate = _descent.Rate(state.DepthM, HeadHeatW(state), WallHeatW(state));
        var area = Math.PI * _scenario.Probe.RadiusM * _scenario.Probe.RadiusM;
        var density = Physics.Ice.IceIh.DensityKgPerM3(rate.IceTemperatureK, Math.Max(rate.PressurePa, 0));
        var meltEnthalpy = (rate.SensibleW + rate.LatentW) / (density * area * v);
        var scale = HeadScale(state);
        var differenceW = (state.SegmentLossFraction * state.HeadSetpointW * scale / 2) - (state.SteeringW * scale);
        var turn = TiltDynamics.HeadTurnRateRadPerS(differenceW, _scenario.Probe.RadiusM, density, meltEnthalpy);
        // The clearance is the water gap the side balance leaves along the body: wall heat widens it (item of the side balance).
        var clearanceM = rate.ClearanceM > 0 ? rate.ClearanceM : _scenario.Probe.FreezeGapM;
        var limit = TiltDynamics.KinematicTurnRateLimitRadPerS(v, clearanceM, _scenario.Probe.LengthM);
        return TiltDynamics.TiltRateRadPerS(state.TiltRad, 0.0, turn, 0.0, _scenario.Probe.LengthM / v, limit);
    }

    /// <summary>Sets regime and velocity for the depth and power now in force, logging every change of regime.</summary>
    private ProbeState Retune(ProbeState state, ComponentContext context)
    {
        state = Rebus(state, context);
        if (state.HeldAtSurface) return state with { VelocityMPerS = 0.0 };
        switch (state.Regime)
        {
            case ProbeRegime.AtOcean:
                return state with { VelocityMPerS = 0.0 };
            case ProbeRegime.FrozenIn:
                return StartMeltingFree(state, context);
            case ProbeRegime.MeltingFree when HeadHeatW(state) + WallHeatW(state) <= 0:
                context.Cancel(state.PendingThermal!.Value);
                return ChangeRegime(state with { PendingThermal = null }, ProbeRegime.FrozenIn, context, "heaters lost while melting free");
            case ProbeRegime.MeltingFree:
                return state with { VelocityMPerS = 0.0 };
        }

        var rate = _descent.Rate(state.DepthM, HeadHeatW(state), WallHeatW(state));
        if (rate.Regime == DescentRegimeKind.Stalled)
        {
            return state.Regime == ProbeRegime.Stopped ? state with { VelocityMPerS = 0.0 } : Stop(state, rate, context);
        }

        if (rate.Regime == DescentRegimeKind.Melting && rate.Held)
        {
            return RefreezeStall(state, rate, context);
        }

        if (state.PendingThermal is { } freezing)
        {
            context.Cancel(freezing);
            state = state with { PendingThermal = null };
        }

        var regime = rate.Regime == DescentRegimeKind.Sublimating ? ProbeRegime.Sublimating : ProbeRegime.Melting;
        state = ChangeRegime(state, regime, context, "heater power and ice allow descent");
        var deficit = rate.Regime == DescentRegimeKind.Melting && !rate.WallPowerSufficient;
        if (deficit != state.WallDeficit)
        {
            context.Record(deficit ? "probe.wall_deficit" : "probe.wall_sufficient", deficit ? Severity.Warning : Severity.Notice,
                RecordField.Of("depth_m", state.DepthM),
                RecordField.Of("wall_power_w", WallPowerW(state)),
                RecordField.Of("lateral_loss_w", rate.LateralLossW),
                RecordField.Of("ice_temperature_k", rate.IceTemperatureK));
        }

        return state with { VelocityMPerS = rate.VelocityMPerS, LastMovingVelocityMPerS = rate.VelocityMPerS, WallDeficit = deficit };
    }

    /// <summary>
    /// The probe stops. Unless its wall heaters can hold the water gap open against the conduction loss of the
    /// stopped body (<see cref="StallLimit"/>), the gap freezes after the time the Stefan problem gives
    /// (<see cref="Refreeze.FreezeInAroundProbe"/>), with the ice behind the wall warmed for half the time the
    /// body took to pass (MODEL: the exposure of the body's middle, ℓ/(2v)).
    /// </summary>
    private ProbeState Stop(ProbeState state, DescentRate rate, ComponentContext context)
    {
        state = ChangeRegime(state with { VelocityMPerS = 0.0, StoppedAt = context.Now }, ProbeRegime.Stopped, context, "heater power below what descent needs");
        if (state.Regime == ProbeRegime.Stopped && state.LastMovingVelocityMPerS > 0 && state.DepthM >= _descent.LiquidOnsetDepthM)
        {
            var phi = IceConductivity.KirchhoffPotentialWPerM(rate.IceTemperatureK, rate.MeltingTemperatureK, IceConductivityFit.PetrenkoWhitworth1999);
            var holdOpenW = StallLimit.StallPowerW(StallLimit.ProbeCapacitanceM(_scenario.Probe.RadiusM, _scenario.Probe.LengthM), phi);
            if (HeadHeatW(state) + WallHeatW(state) < holdOpenW)
            {
                var exposureS = _scenario.Probe.LengthM / (2 * state.LastMovingVelocityMPerS);
                var freeze = Refreeze.FreezeInAroundProbe(_scenario.Probe.FreezeGapM, _scenario.Probe.RadiusM, exposureS, rate.IceTemperatureK, rate.MeltingTemperatureK);
                context.Record("probe.refreezing", Severity.Alarm,
                    RecordField.Of("depth_m", state.DepthM),
                    RecordField.Of("gap_m", _scenario.Probe.FreezeGapM),
                    RecordField.Of("freeze_time_s", freeze.FreezeTimeS),
                    RecordField.Of("stefan_number", freeze.StefanNumber),
                    RecordField.Of("hold_open_power_w", holdOpenW));
                if (freeze.FreezeTimeS < MaxTimerS)
                {
                    var handle = context.ScheduleSelf(SimDuration.FromSeconds(freeze.FreezeTimeS), new ProbeThermalDue(ProbeRegime.FrozenIn), MissionPriority.Physics);
                    state = state with { PendingThermal = handle };
                }
            }
        }

        return state;
    }

    private ProbeState Thermal(ProbeState state, ProbeThermalDue due, ComponentContext context) => due.Completes switch
    {
        ProbeRegime.FrozenIn when state.Regime == ProbeRegime.Stopped =>
            ChangeRegime(state, ProbeRegime.FrozenIn, context, "the water gap around the body has frozen"),
        ProbeRegime.Melting when state.Regime == ProbeRegime.MeltingFree =>
            ChangeRegime(state, ProbeRegime.Stopped, context, "the frozen gap is melted open") with { LastMovingVelocityMPerS = 0.0 },
        _ => throw new InvalidOperationException($"A thermal timer for {due.Completes} fired in regime {state.Regime}; its cancellation was missed."),
    };

    /// <summary>
    /// A refreeze stall: the side balance of the moving probe (<see cref="SideBalance"/>) closes its water gap within the
    /// body's length, so the ice holds it where it is. Logged with the balance's numbers.
    /// </summary>
    private ProbeState RefreezeStall(ProbeState state, DescentRate rate, ComponentContext context)
    {
        if (state.PendingThermal is { } pending) context.Cancel(pending);
        context.Record("probe.refreeze_stall", Severity.Critical,
            RecordField.Of("depth_m", state.DepthM),
            RecordField.Of("required_side_heat_w", rate.RequiredSideHeatW),
            RecordField.Of("side_heat_supplied_w", rate.SideHeatSuppliedW),
            RecordField.Of("refreeze_closure_m", rate.RefreezeClosureM),
            RecordField.Of("body_length_m", _scenario.Probe.LengthM),
            RecordField.Of("ice_temperature_k", rate.IceTemperatureK));
        var stopped = state with { VelocityMPerS = 0.0, PendingThermal = null, StoppedAt = context.Now, WallDeficit = false };
        return ChangeRegime(stopped, ProbeRegime.FrozenIn, context, string.Create(System.Globalization.CultureInfo.InvariantCulture, $"refrozen water closed the gap {rate.RefreezeClosureM:F2} m behind the head"));
    }

    /// <summary>
    /// A frozen-in probe melts its gap open with its head and wall heat (<see cref="Refreeze.MeltFree"/>, the longer it
    /// was held the more the ice has cooled), or stays held. Freeing is pointless while the side balance at the present
    /// power would close the gap again as soon as the probe moved: that, and power too small ever to melt free, are
    /// logged once per power setting with the numbers.
    /// </summary>
    private ProbeState StartMeltingFree(ProbeState state, ComponentContext context)
    {
        var headW = HeadHeatW(state);
        var wallW = WallHeatW(state);
        var powerW = headW + wallW;
        if (powerW <= 0 || state.MeltFreeRefusedAtWallW == powerW) return state with { VelocityMPerS = 0.0 };
        var moving = _descent.Rate(state.DepthM, headW, wallW);
        if (moving.Regime == DescentRegimeKind.Melting && moving.Held)
        {
            context.Record("probe.cannot_melt_free", Severity.Critical,
                RecordField.Of("depth_m", state.DepthM),
                RecordField.Of("head_power_w", headW),
                RecordField.Of("wall_power_w", wallW),
                RecordField.Of("cause", "side balance short: the gap would close again"),
                RecordField.Of("required_side_heat_w", moving.RequiredSideHeatW),
                RecordField.Of("side_heat_supplied_w", moving.SideHeatSuppliedW),
                RecordField.Of("refreeze_closure_m", moving.RefreezeClosureM));
            return state with { VelocityMPerS = 0.0, MeltFreeRefusedAtWallW = powerW };
        }

        var iceK = _descent.Shell.TemperatureK(state.DepthM);
        var meltingK = MeltingCurve.TemperatureK(Math.Max(_descent.Shell.PressurePa(state.DepthM), TriplePoint.PressurePa));
        var exposureS = Math.Max(1.0, state.LastMovingVelocityMPerS > 0 ? _scenario.Probe.LengthM / (2 * state.LastMovingVelocityMPerS) : 1.0);
        var heldS = state.StoppedAt is { } stoppedAt ? (context.Now - stoppedAt).TotalSeconds : 0.0;
        var free = Refreeze.MeltFree(_scenario.Probe.FreezeGapM, _scenario.Probe.RadiusM, _scenario.Probe.LengthM, powerW, exposureS, Math.Min(iceK, meltingK - 1e-3), meltingK, heldS);
        if (!double.IsFinite(free.TimeS))
        {
            context.Record("probe.cannot_melt_free", Severity.Critical,
                RecordField.Of("depth_m", state.DepthM),
                RecordField.Of("head_power_w", headW),
                RecordField.Of("wall_power_w", wallW),
                RecordField.Of("cause", "heat below the steady loss of the held body"),
                RecordField.Of("hold_open_power_w", free.HoldOpenPowerW));
            return state with { VelocityMPerS = 0.0, MeltFreeRefusedAtWallW = powerW };
        }

        context.Record("probe.melting_free", Severity.Notice,
            RecordField.Of("depth_m", state.DepthM),
            RecordField.Of("wall_power_w", wallW),
            RecordField.Of("head_power_w", headW),
            RecordField.Of("held_s", heldS),
            RecordField.Of("cooling_j", free.CoolingJ),
            RecordField.Of("time_s", free.TimeS),
            RecordField.Of("energy_j", free.EnergyJ));
        var handle = context.ScheduleSelf(SimDuration.FromSeconds(free.TimeS), new ProbeThermalDue(ProbeRegime.Melting), MissionPriority.Physics);
        return ChangeRegime(state with { VelocityMPerS = 0.0, PendingThermal = handle, MeltFreeRefusedAtWallW = null }, ProbeRegime.MeltingFree, context, "heaters powered");
    }

    private static ProbeState ChangeRegime(ProbeState state, ProbeRegime regime, ComponentContext context, string cause)
    {
        if (regime == state.Regime) return state;
        var severity = regime switch
        {
            ProbeRegime.Stopped => Severity.Warning,
            ProbeRegime.FrozenIn => Severity.Critical,
            _ => Severity.Notice,
        };
        context.Record("probe.regime", severity,
            RecordField.Of("from", state.Regime.ToString()),
            RecordField.Of("to", regime.ToString()),
            RecordField.Of("depth_m", state.DepthM),
            RecordField.Of("cause", cause));
        return state with { Regime = regime };
    }

    /// <summary>Replaces the pending step by one at the next frame or the next depth crossing, whichever comes first.</summary>
    private ProbeState Replan(ProbeState state, ComponentContext context)
    {
        if (state.PendingStep is { } pending) context.Cancel(pending);

        var next = state.NextFrameAt;
        if (IsMoving(state.Regime) && state.VelocityMPerS > 0)
        {
            var target = state.Regime == ProbeRegime.Sublimating ? _descent.LiquidOnsetDepthM : _scenario.Shell.ThicknessM;
            foreach (var trigger in state.DepthTriggers)
            {
                if (trigger.DepthM > state.DepthM) target = Math.Min(target, trigger.DepthM);
            }

            var remaining = Math.Max(0.0, target - state.DepthM);
            // Rounded up to the next tick so the step lands on or just past the boundary, never just short of it.
            var vertical = Math.Max(state.VelocityMPerS * Math.Cos(state.TiltRad), 1e-12);
            var crossing = context.Now + new SimDuration((long)Math.Ceiling(Math.Min(remaining / vertical, 1e12) * SimDuration.TicksPerSecond));
            if (crossing < next) next = SimTime.Max(crossing, context.Now);
        }

        if (state.Bus is { } bus && _power!.Battery is { } battery)
        {
            // The bus changes when the battery runs dry: a step at that instant (rounded up to a tick) reallocates it.
            var emptyS = PowerBus.TimeToEmptyS(bus.Allocation, bus.StateOfCharge, battery);
            if (emptyS < MaxTimerS)
            {
                var empty = context.Now + new SimDuration((long)Math.Ceiling(emptyS * SimDuration.TicksPerSecond));
                if (empty < next) next = empty;
            }
        }

        var handle = context.ScheduleSelf(next - context.Now, ProbeStepDue.Instance, MissionPriority.Physics);
        return state with { PendingStep = handle };
    }

    private ProbeState SendFrame(ProbeState state, ComponentContext context)
    {
        var truth = TrueReadings(state);
        var reported = new List<(string Point, double Value)>(truth.Count);
        foreach (var (point, value) in truth)
        {
            var fault = state.SensorFaults.LastOrDefault(f => f.Fault.Point == point);
            switch (fault?.Fault.Kind)
            {
                case null:
                    reported.Add((point, value));
                    break;
                case FaultKind.SensorStuck:
                    reported.Add((point, fault.StuckAtSi!.Value));
                    break;
                case FaultKind.SensorBias:
                    reported.Add((point, value + fault.Fault.ValueSi!.Value));
                    break;
                case FaultKind.SensorNoise:
                    // Drawn from the probe's stream only while the fault lasts, so runs without it keep their draws.
                    reported.Add((point, value + context.Random.NextNormal(0.0, fault.Fault.ValueSi!.Value)));
                    break;
                case FaultKind.SensorDropout:
                    break;
            }
        }

        var frame = new TelemetryFrame(state.FramesSent + 1, context.Now, state.Regime.ToString(), reported, state.DepthM, state.VehiclesActive);
        context.Record("probe.telemetry", Severity.Debug, [.. TelemetryFields(state, frame, truth)]);
        context.Schedule(MissionIds.Tether, SimDuration.Zero, frame, MissionPriority.Telemetry);
        context.Schedule(MissionIds.Autonomy, SimDuration.Zero, frame, MissionPriority.Telemetry);
        if (_watchedByFaults)
        {
            context.Schedule(MissionIds.FaultInjector, SimDuration.Zero, new TrueStateFrame(frame with { Readings = truth }), MissionPriority.Telemetry);
        }

        return state with { FramesSent = frame.Sequence, NextFrameAt = context.Now + _frameInterval };
    }

    /// <summary>The true values of a frame as logged; the bus figures only for a probe with a power system.</summary>
    private IEnumerable<RecordField> TelemetryFields(ProbeState state, TelemetryFrame frame, IReadOnlyList<(string Point, double Value)> truth)
    {
        IEnumerable<RecordField> fields =
        [
            RecordField.Of("frame", frame.Sequence),
            RecordField.Of("regime", frame.Regime),
            RecordField.Of("depth_m", state.DepthM),
            RecordField.Of("velocity_m_s", state.VelocityMPerS),
            RecordField.Of("ice_temperature_k", truth.First(r => r.Point == "probe.ice_temperature").Value),
            RecordField.Of("head_power_w", HeadPowerW(state)),
            RecordField.Of("wall_power_w", WallPowerW(state)),
            RecordField.Of("energy_used_j", state.EnergyUsedJ),
            RecordField.Of("tilt_rad", state.TiltRad),
            RecordField.Of("lateral_drift_m", state.LateralDriftM),
            RecordField.Of("buffer_fill", state.BufferFill),
        ];
        if (state.Bus is not { } bus) return fields;
        var e = bus.Energy;
        return fields.Concat(
        [
            RecordField.Of("battery_soc", bus.StateOfCharge),
            RecordField.Of("bus_power_available_w", bus.Allocation.AvailablePowerW),
            RecordField.Of("bus_load_w", bus.Allocation.Loads.SuppliedPowerW),
            RecordField.Of("source_power_w", bus.Allocation.SourcePowerW),
            RecordField.Of("harvest_power_w", bus.Allocation.HarvestPowerW),
            RecordField.Of("source_j", e.SourceJ),
            RecordField.Of("harvest_j", e.HarvestJ),
            RecordField.Of("battery_out_j", e.BatteryOutJ),
            RecordField.Of("battery_in_j", e.BatteryInJ),
            RecordField.Of("loads_j", e.LoadsJ),
            RecordField.Of("unserved_j", e.UnservedJ),
            RecordField.Of("curtailed_j", e.CurtailedJ),
            RecordField.Of("battery_loss_j", e.BatteryLossJ),
            RecordField.Of("self_discharge_j", e.SelfDischargeJ),
        ]);
    }

    /// <summary>What the probe's sensors would read if none were faulty, in the catalogue's point names and SI units.</summary>
    private IReadOnlyList<(string Point, double Value)> TrueReadings(ProbeState state) =>
    [
        ("probe.depth", state.DepthM),
        ("probe.velocity", state.VelocityMPerS),
        ("probe.ice_temperature", _descent.Shell.TemperatureK(state.DepthM)),
        ("probe.head_power", HeadPowerW(state)),
        ("probe.wall_power", WallPowerW(state)),
        ("probe.energy_used", state.EnergyUsedJ),
        ("probe.tilt", state.TiltRad),
        ("probe.battery_soc", state.Bus?.StateOfCharge ?? 0.0),
        ("probe.bus_power_available", state.Bus?.Allocation.AvailablePowerW ?? BusPowerW(state)),
        ("probe.buffer_fill", state.BufferFill),
    ];

    private ProbeState Breakthrough(ProbeState state, ComponentContext context)
    {
        context.Record("probe.breakthrough", Severity.Notice,
            RecordField.Of("depth_m", state.DepthM),
            RecordField.Of("energy_used_j", state.EnergyUsedJ),
            RecordField.Of("vehicles", _scenario.Vehicles.Count));
        foreach (var vehicle in _scenario.Vehicles)
        {
            context.Schedule(MissionIds.Vehicle(vehicle.Name), SimDuration.Zero, new ReleaseVehicle(state.DepthM, _descent.Shell.BasePressurePa, _descent.Shell.BaseTemperatureK), MissionPriority.Command);
        }

        if (_scenario.Vehicles.Count == 0)
        {
            context.StopRun(RunOutcomeKind.Completed, "the probe reached the ocean; no vehicles to release");
        }

        state = ChangeRegime(state, ProbeRegime.AtOcean, context, "breakthrough into the ocean");
        return state with
        {
            BreakthroughAt = context.Now,
            VehiclesActive = _scenario.Vehicles.Count,
            NextFrameAt = context.Now,
            WallDeficit = false,
        };
    }

    private ProbeState OnVehicleFinished(ProbeState state, VehicleFinished finished, ComponentContext context)
    {
        var next = Advance(state, context.Now) with
        {
            VehiclesActive = state.VehiclesActive - 1,
            VehiclesFinished = state.VehiclesFinished + (finished.Lost ? 0 : 1),
            VehiclesLost = state.VehiclesLost + (finished.Lost ? 1 : 0),
        };
        if (next.VehiclesFinished + next.VehiclesLost < _scenario.Vehicles.Count) return next;

        // Older logs carry no vehicles_lost field: it is written only when a vehicle was lost.
        RecordField[] fields = next.VehiclesLost > 0
            ? [RecordField.Of("vehicles_finished", next.VehiclesFinished), RecordField.Of("energy_used_j", next.EnergyUsedJ), RecordField.Of("vehicles_lost", next.VehiclesLost)]
            : [RecordField.Of("vehicles_finished", next.VehiclesFinished), RecordField.Of("energy_used_j", next.EnergyUsedJ)];
        context.Record("probe.mission_complete", Severity.Notice, fields);
        if (next.VehiclesFinished == 0)
        {
            context.StopRun(RunOutcomeKind.MissionLost, $"all {next.VehiclesLost} vehicles lost");
        }
        else
        {
            context.StopRun(RunOutcomeKind.Completed, next.VehiclesLost > 0
                ? $"{next.VehiclesFinished} vehicles finished their tasks, {next.VehiclesLost} lost"
                : $"all {next.VehiclesFinished} vehicles finished their tasks");
        }

        return next;
    }

    private static bool IsMoving(ProbeRegime regime) => regime is ProbeRegime.Sublimating or ProbeRegime.Melting;

    /// <summary>What the head heater asks of the bus: its set point less a failed segment's share; nothing at rest or while held at the surface.</summary>
    private static double HeadDemandW(ProbeState state) =>
        state.Regime == ProbeRegime.AtOcean || state.Paused || state.HeldAtSurface ? 0.0 : state.HeadSetpointW * (1 - (state.SegmentLossFraction / 2));

    private static double WallDemandW(ProbeState state) =>
        state.Regime == ProbeRegime.AtOcean || state.HeldAtSurface ? 0.0 : state.WallSetpointW;

    /// <summary>Share of the head's set point its segments get: the dip's share without a bus, all or nothing with one.</summary>
    private double HeadScale(ProbeState state) =>
        state.Bus is null ? state.PowerFraction : IsRunning(state.Bus, _power!.HeadLoad) ? 1.0 : 0.0;

    private double HeadPowerW(ProbeState state) => HeadDemandW(state) * HeadScale(state);

    private double WallPowerW(ProbeState state) =>
        state.Bus is null ? WallDemandW(state) * state.PowerFraction : IsRunning(state.Bus, _power!.WallLoad) ? WallDemandW(state) : 0.0;

    /// <summary>
    /// Heat reaching the head: its heater's electric power and the source's waste heat along the heat path, which flows
    /// whatever the bus does (<see cref="ProbePowerSystem.WasteHeat"/>). Rounded to 10 W so that the slow decay of the
    /// source does not defeat the descent model's cache (MODEL: 10 W is well below the model's own uncertainty).
    /// </summary>
    private double HeadHeatW(ProbeState state) => HeadPowerW(state) + Waste(state).HeadW;

    /// <summary>Heat reaching the side wall: its heaters' electric power and the waste heat's share.</summary>
    private double WallHeatW(ProbeState state) => WallPowerW(state) + Waste(state).WallW;

    private WasteHeatSplit Waste(ProbeState state)
    {
        if (_power is not { HeatsProbe: true } || state.Regime == ProbeRegime.AtOcean || state.HeldAtSurface) return default;
        var split = _power.WasteHeat(state.LastUpdate.SecondsSinceEpoch);
        return new WasteHeatSplit(Math.Round(split.HeadW / 10.0) * 10.0, Math.Round(split.WallW / 10.0) * 10.0, split.RejectedW);
    }

    private double BusPowerW(ProbeState state) =>
        state.Bus is null ? HeadPowerW(state) + WallPowerW(state) + _scenario.Probe.ElectronicsPowerW : state.Bus.Allocation.Loads.SuppliedPowerW;

    private static bool IsRunning(ProbeBusState bus, string load) => bus.Allocation.Loads.Running.Any(l => l.Name == load);

    /// <summary>
    /// Reallocates the bus for the instant: the source as decayed and dipped, the turbine once in the ocean, the
    /// heaters' demands now, less what telecommands switched off. Every load that stops or starts is logged with why.
    /// </summary>
    private ProbeState Rebus(ProbeState state, ComponentContext context)
    {
        if (state.Bus is not { } bus) return state;
        var loads = _power!.Loads(HeadDemandW(state), WallDemandW(state), bus.SwitchedOff, state.DockDemandsW);
        var allocation = _power.Allocate(context.Now.SecondsSinceEpoch, state.PowerFraction, state.Regime == ProbeRegime.AtOcean, bus.StateOfCharge, bus.BatteryLockedOut, loads);
        var isStart = bus.Allocation.Loads.Running.Count == 0 && bus.Allocation.Loads.Shed.Count == 0;
        foreach (var model in _power.LoadModels)
        {
            var wasOff = isStart ? null : OffCause(bus.Allocation, model.Name);
            var isOff = OffCause(allocation, model.Name);
            if (wasOff == isOff) continue;
            var demandW = _power.Loads(HeadDemandW(state), WallDemandW(state), ImmutableSortedSet<string>.Empty).Single(l => l.Name == model.Name).PowerW;
            context.Record(isOff is null ? "probe.load_restored" : "probe.load_shed", isOff is null ? Severity.Notice : Severity.Warning,
                RecordField.Of("load", model.Name),
                RecordField.Of("priority", model.Priority),
                RecordField.Of("demand_w", demandW),
                RecordField.Of("available_w", allocation.AvailablePowerW),
                RecordField.Of("battery_soc", bus.StateOfCharge),
                RecordField.Of("cause", isOff ?? wasOff ?? ""));
        }

        return Redock(state with { Bus = bus with { Allocation = allocation } }, context);
    }

    /// <summary>Tells each docked vehicle when what the bus gives its charger changes: its request while the load runs, else nothing.</summary>
    private ProbeState Redock(ProbeState state, ComponentContext context)
    {
        var granted = state.DockGrantedW;
        foreach (var (vehicle, demandW) in state.DockDemandsW)
        {
            var powerW = IsRunning(state.Bus!, ProbePowerSystem.DockLoadName(vehicle)) ? demandW : 0.0;
            if (granted.TryGetValue(vehicle, out var before) && before == powerW) continue;
            context.Record("probe.dock_power", Severity.Info,
                RecordField.Of("vehicle", vehicle),
                RecordField.Of("request_w", demandW),
                RecordField.Of("granted_w", powerW),
                RecordField.Of("available_w", state.Bus!.Allocation.AvailablePowerW));
            context.Schedule(MissionIds.Vehicle(vehicle), SimDuration.Zero, new DockPower(powerW), MissionPriority.Command);
            granted = granted.SetItem(vehicle, powerW);
        }

        foreach (var gone in granted.Keys.Where(v => !state.DockDemandsW.ContainsKey(v)).ToList()) granted = granted.Remove(gone);
        return state with { DockGrantedW = granted };
    }

    /// <summary>
    /// Why a load gets no power under an allocation: "bus" when it was shed, "command" when it was switched off (a
    /// switched-off load asks for nothing, so it is in neither list); null when it runs.
    /// </summary>
    private static string? OffCause(BusAllocation allocation, string load) =>
        allocation.Loads.Shed.Any(l => l.Name == load) ? "bus"
        : allocation.Loads.Running.Any(l => l.Name == load) ? null
        : "command";

    private void RecordPowerSystem(ProbeState state, ComponentContext context)
    {
        if (_power is null) return;
        context.Record("probe.power", Severity.Info,
            RecordField.Of("source", _power.SourceKind.ToString()),
            RecordField.Of("source_power_w", _power.SourcePowerW(0.0)),
            RecordField.Of("source_thermal_power_w", _power.SourceThermalPowerW(0.0)),
            RecordField.Of("battery_capacity_j", _power.Battery?.EffectiveCapacityJ ?? 0.0),
            RecordField.Of("battery_soc", state.Bus!.StateOfCharge),
            RecordField.Of("loads", string.Join(", ", _power.LoadModels.Select(l => $"{l.Name}:{l.Priority}"))));
        if (!_power.HeatsProbe) return;
        var waste = _power.WasteHeat(0.0);
        context.Record("probe.heat_path", Severity.Info,
            RecordField.Of("waste_heat_to_head_w", waste.HeadW),
            RecordField.Of("waste_heat_to_wall_w", waste.WallW),
            RecordField.Of("waste_heat_rejected_w", waste.RejectedW));
    }
}
