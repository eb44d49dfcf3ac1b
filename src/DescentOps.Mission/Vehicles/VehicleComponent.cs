using DescentOps.Engine.Components;
using DescentOps.Records;
using DescentOps.Mission.Messages;
using DescentOps.Physics.Ocean;
using DescentOps.Physics.Seawater;
using DescentOps.Scenarios.Envelope;
using DescentOps.Physics.Vehicles;
using DescentOps.Primitives.Time;
using DescentOps.Scenarios.Model;
using DescentOps.Records.Kinds;

namespace DescentOps.Mission.Vehicles;

/// <summary>
/// A vehicle released at breakthrough. It flies its task's legs (<see cref="VehicleTaskPlan"/>) at the speed and power
/// its kind gives (<see cref="VehiclePerformance"/>), drifting with the current. Without a dock it works until its
/// reserve and stops; with one it turns home by the scenario's battery rule (<see cref="DockRule"/>), recharges and goes
/// out again. With an acoustic link it sends a data message every interval, keeps what does not get through and
/// delivers it when contact returns. It is lost when its battery runs flat, when it is entrapped for good, or when it
/// has been out of contact too long; the log says which.
/// </summary>
public sealed class VehicleComponent : SimComponent<VehicleState>
{
    /// <summary>Slowest leg speed as a share of the nominal one, so that a wild draw cannot stall a leg forever.</summary>
    private const double MinimumSpeedShare = 0.2;

    public const string RecallCommand = "recall_vehicle";

    private readonly VehicleModel _vehicle;
    private readonly LanderIds _ids;
    private readonly AcousticsModel? _acoustics;
    private readonly Scenario _scenario;
    private readonly double _gravityMPerS2;

    /// <summary>With a power system on the probe the dock's charger draws on the probe's bus, which may shed it.</summary>
    private readonly bool _dockOnProbeBus;

    public VehicleComponent(VehicleModel vehicle, Scenario scenario, LanderIds? ids = null)
        : base((ids ?? LanderIds.Single).Vehicle(vehicle.Name), FailurePolicy.RestartFromLastState)
    {
        _ids = ids ?? LanderIds.Single;
        ArgumentNullException.ThrowIfNull(scenario);
        _vehicle = vehicle;
        _acoustics = scenario.Acoustics;
        _scenario = scenario;
        _gravityMPerS2 = scenario.Body.GravityMPerS2;
        _dockOnProbeBus = scenario.Power is not null;
    }

    public override VehicleState InitialState => new(
        VehiclePhase.Stowed, _vehicle.BatteryEnergyJ, OceanVector.Zero, null, null, 0, 0, 0, 1, 0.0, 0.0, 273.15, 0.0, 0.0, 0.0,
        VehicleLinkState.Initial, false, false, null, null);

    private double MessageIntervalS => _acoustics?.MessageIntervalS ?? Scenarios.Loading.ScenarioLoader.DefaultMessageIntervalS;

    public override VehicleState Handle(VehicleState state, object message, ComponentContext context)
    {
        switch (message)
        {
            case RunStarted:
                return state;
            case ReleaseVehicle release when !state.Released:
                return Release(state, release, context);
            case VehicleLegDone done when state.Leg is not null:
                return done.BatteryEmpty ? Lost(state, state.Leg.Held ? "flat battery while entrapped" : "flat battery", context) : EndLeg(state, context);
            case VehicleCharged:
                return Charged(state with { PendingTimer = null }, context);
            case DockPower power:
                return OnDockPower(state, power, context);
            case VehicleMessageDue:
                return MessageDue(state with { PendingTick = null }, context);
            case FaultStarted { Fault.Effect: FaultEffect.VehicleLoss loss } fault:
                return FaultBegins(state, fault.Fault, loss, context);
            case FaultCleared { Fault.Effect: FaultEffect.VehicleLoss loss } fault:
                return FaultEnds(state, fault.Fault, loss, context);
            case Telecommand { Command.Command: RecallCommand } command:
                return Recall(state, command, context);
            default:
                throw new InvalidOperationException($"Vehicle {_vehicle.Name} cannot handle {message.GetType().Name}.");
        }
    }

    private VehicleState Release(VehicleState state, ReleaseVehicle release, ComponentContext context)
    {
        context.Record(VehicleRecords.Released, Severity.Notice,
            RecordField.Of("interface_depth_m", release.InterfaceDepthM),
            RecordField.Of("battery_j", state.BatteryJ));
        state = state with
        {
            Phase = VehiclePhase.Working,
            InterfaceDepthM = release.InterfaceDepthM,
            BasePressurePa = release.BasePressurePa,
            BaseTemperatureK = release.BaseTemperatureK,
            Link = state.Link with { LastFixAt = context.Now },
        };
        if (_acoustics is not null)
        {
            var link = Link(state)!;
            context.Record(VehicleRecords.AcousticLink, Severity.Info,
                RecordField.Of("frequency_hz", _acoustics.FrequencyHz),
                RecordField.Of("absorption_db_per_km", link.Link.AbsorptionDbPerKm),
                RecordField.Of("earth_equivalent_depth_m", link.EarthEquivalentDepthM),
                RecordField.Of("sound_speed_m_s", link.SoundSpeedMPerS),
                RecordField.Of("max_range_m", link.MaximumRangeM));
            state = ArmTick(state, context);
        }

        if (_vehicle.UsesExtendedModel)
        {
            var performance = Performance(state);
            context.Record(VehicleRecords.Performance, Severity.Info,
                RecordField.Of("kind", _vehicle.Kind.ToString()),
                RecordField.Of("task", _vehicle.Task.ToString()),
                RecordField.Of("cruise_speed_m_s", performance.CruiseSpeedMPerS),
                RecordField.Of("moving_power_w", performance.MovingPowerW),
                RecordField.Of("energy_per_km_j", performance.CruiseEnergyJ(1000.0, 0.0)),
                RecordField.Of("glide_path_angle_rad", performance.Glide?.GlidePathAngleRad ?? 0.0));
        }

        return NextTaskLeg(state, context);
    }

    // ---- legs ----------------------------------------------------------------------------------------------------

    private VehicleState NextTaskLeg(VehicleState state, ComponentContext context)
    {
        var performance = Performance(state);
        var plan = VehicleTaskPlan.Leg(performance, state.Cycle, state.LegIndex, state.Position);
        if (_vehicle.Dock is { } dock)
        {
            var end = EndOf(state.Position, plan, plan.WaterVelocity, plan.SecondsAt(1.0));
            var home = performance.CruiseEnergyJ(end.Length, end.Down);
            if (DockRule.ReturnReason(state.BatteryJ, _vehicle.BatteryEnergyJ, dock.ReturnAtFraction, _vehicle.ReserveFraction, plan.NominalEnergyJ, home) is { } reason)
            {
                return StartHome(state, reason, context);
            }
        }
        else if (state.BatteryJ - RestOfCycleEnergyJ(performance, state) < _vehicle.ReserveFraction * _vehicle.BatteryEnergyJ)
        {
            // A cycle is only started (or carried on) if what is left of it fits above the reserve.
            return Finish(state, "battery at reserve", context);
        }

        var share = Math.Max(MinimumSpeedShare, 1.0 + (_vehicle.SpeedVariation * context.Random.NextNormal(0.0, 1.0)));
        var water = plan.WaterVelocity * share;
        return StartLeg(state, plan, water, water + Current, plan.SecondsAt(share), home: false, context);
    }

    private double RestOfCycleEnergyJ(VehiclePerformance performance, VehicleState state)
    {
        var total = 0.0;
        var at = state.Position;
        for (var leg = state.LegIndex; leg < VehicleTaskPlan.LegsPerCycle(_vehicle.Task); leg++)
        {
            var plan = VehicleTaskPlan.Leg(performance, state.Cycle, leg, at);
            total += plan.NominalEnergyJ;
            at = EndOf(at, plan, plan.WaterVelocity, plan.SecondsAt(1.0));
        }

        return total;
    }

    private VehicleState StartHome(VehicleState state, string reason, ComponentContext context)
    {
        var performance = Performance(state);
        var plan = VehicleTaskPlan.Home(performance, state.Position);
        var toDock = state.Position * -1.0;
        var closing = HomingSpeed.ClosingSpeedMPerS(performance.CruiseSpeedMPerS, Current, toDock);
        var distance = toDock.Length;
        var direction = distance > 0 ? toDock * (1.0 / distance) : OceanVector.Zero;
        var ground = direction * closing;
        context.Record(VehicleRecords.Returning, Severity.Notice,
            RecordField.Of("reason", reason),
            RecordField.Of("distance_m", distance),
            RecordField.Of("closing_speed_m_s", closing),
            RecordField.Of("battery_j", state.BatteryJ),
            RecordField.Of("estimated_energy_j", performance.CruiseEnergyJ(distance, state.Position.Down)));
        state = state with { Phase = VehiclePhase.Returning };
        if (distance <= 0) return Docked(state, context);
        var seconds = closing > 0 ? distance / closing : double.PositiveInfinity;
        if (!double.IsFinite(seconds) && plan.PowerW <= 0) return Lost(state, "cannot make headway against the current", context);
        return StartLeg(state, plan, ground - Current, ground, seconds, home: true, context);
    }

    private VehicleState StartLeg(VehicleState state, PlannedLeg plan, OceanVector water, OceanVector ground, double seconds, bool home, ComponentContext context, bool held = false)
    {
        var leg = new VehicleLeg(plan, context.Now, state.Position, state.BatteryJ, water, ground, plan.PowerW, seconds, plan.EndEnergyJ, home, held);
        return Schedule(state with { Leg = leg }, context);
    }

    /// <summary>Arms the timer of the leg under way: its end, or the instant its battery runs flat if that comes first.</summary>
    private static VehicleState Schedule(VehicleState state, ComponentContext context)
    {
        var leg = state.Leg!;
        var energy = (leg.PowerW * leg.Seconds) + leg.EndEnergyJ;
        var empty = !(energy <= leg.StartBatteryJ);
        var seconds = empty ? (leg.PowerW > 0 ? Math.Min(leg.StartBatteryJ / leg.PowerW, leg.Seconds) : leg.Seconds) : leg.Seconds;
        if (!double.IsFinite(seconds)) return state;
        var handle = context.ScheduleSelf(SimDuration.FromSeconds(seconds), new VehicleLegDone(empty), MissionPriority.Physics);
        return state with { PendingTimer = handle };
    }

    private VehicleState EndLeg(VehicleState state, ComponentContext context)
    {
        var leg = state.Leg!;
        state = state with
        {
            BatteryJ = leg.StartBatteryJ - ((leg.PowerW * leg.Seconds) + leg.EndEnergyJ),
            Position = EndOf(leg.StartPosition, leg.Plan, leg.GroundVelocity, leg.Seconds),
            WaterDistanceM = state.WaterDistanceM + (leg.WaterVelocity.Length * leg.Seconds),
            EnergyUsedJ = state.EnergyUsedJ + (leg.PowerW * leg.Seconds) + leg.EndEnergyJ,
            Leg = null,
            PendingTimer = null,
        };
        if (leg.Home) return Docked(state with { Position = OceanVector.Zero }, context);

        if (leg.Plan.EndsCycle)
        {
            state = state with { ProfilesCompleted = state.ProfilesCompleted + 1 };
            if (_vehicle.Task == VehicleTask.WaterColumn)
            {
                context.Record(VehicleRecords.Profile, Severity.Info,
                    RecordField.Of("profile", state.ProfilesCompleted),
                    RecordField.Of("max_depth_below_ice_m", _vehicle.ProfileDepthM),
                    RecordField.Of("battery_j", state.BatteryJ));
            }
            else
            {
                context.Record(VehicleRecords.Cycle, Severity.Info,
                    RecordField.Of("task", _vehicle.Task.ToString()),
                    RecordField.Of("cycle", state.ProfilesCompleted),
                    RecordField.Of("battery_j", state.BatteryJ));
            }
        }

        var next = state.LegIndex + 1;
        var wraps = next == VehicleTaskPlan.LegsPerCycle(_vehicle.Task);
        return NextTaskLeg(state with { LegIndex = wraps ? 0 : next, Cycle = wraps ? state.Cycle + 1 : state.Cycle }, context);
    }

    /// <summary>A leg's end point; a vertical leg ends at its target depth exactly, whatever the rounding of its run.</summary>
    private static OceanVector EndOf(OceanVector start, PlannedLeg plan, OceanVector velocity, double seconds)
    {
        var end = start + (velocity * seconds);
        return plan.TargetDownM is { } down ? end with { Down = down } : end;
    }

    /// <summary>Commits the leg under way up to now (an interruption), leaving the rest of it as <see cref="VehicleState.Suspended"/>.</summary>
    private static VehicleState Interrupt(VehicleState state, ComponentContext context)
    {
        if (state.Leg is not { } leg) return state;
        if (state.PendingTimer is { } timer) context.Cancel(timer);
        var elapsed = Math.Min((context.Now - leg.StartAt).TotalSeconds, leg.Seconds);
        var rest = leg.Held ? null : leg with { Seconds = leg.Seconds - elapsed };
        return state with
        {
            BatteryJ = leg.BatteryAfter(elapsed),
            Position = leg.PositionAfter(elapsed),
            WaterDistanceM = state.WaterDistanceM + (leg.WaterVelocity.Length * elapsed),
            EnergyUsedJ = state.EnergyUsedJ + (leg.PowerW * elapsed),
            Leg = null,
            Suspended = rest ?? state.Suspended,
            PendingTimer = null,
        };
    }

    /// <summary>Takes up a suspended leg from here with the battery there is now.</summary>
    private static VehicleState Resume(VehicleState state, ComponentContext context)
    {
        if (state.Suspended is not { } rest) return state;
        var leg = rest with { StartAt = context.Now, StartPosition = state.Position, StartBatteryJ = state.BatteryJ };
        return Schedule(state with { Leg = leg, Suspended = null }, context);
    }

    // ---- dock ------------------------------------------------------------------------------------------------------

    private VehicleState Docked(VehicleState state, ComponentContext context)
    {
        // At the dock the data goes over the dock's own connection, whatever the acoustic link is doing.
        var link = state.Link;
        state = state with { Link = link with { Delivered = link.Delivered + link.Held, Held = 0 } };
        context.Record(VehicleRecords.Docked, Severity.Notice,
            RecordField.Of("sortie", state.Sortie),
            RecordField.Of("battery_j", state.BatteryJ),
            RecordField.Of("data_delivered", link.Held),
            RecordField.Of("nav_error_m", NavigationErrorM(state, context.Now)));
        var dock = _vehicle.Dock;
        if (state.Recalled) return Finish(state, "recalled", context);
        if (dock is null) return Finish(state, "back at the probe", context);
        if (state.Sortie >= dock.Sorties) return Finish(state, "all sorties flown", context);
        if (dock.ChargingPowerW <= 0) return Finish(state, "docked; no charging", context);

        if (_dockOnProbeBus)
        {
            // The charger asks the probe's bus; charging starts when the bus grants it (DockPower).
            context.Record(VehicleRecords.Charging, Severity.Info,
                RecordField.Of("battery_j", state.BatteryJ),
                RecordField.Of("charging_power_w", dock.ChargingPowerW),
                RecordField.Of("fed_by", "probe bus"));
            context.Schedule(_ids.Probe, SimDuration.Zero, new DockLoad(_vehicle.Name, dock.ChargingPowerW), MissionPriority.Command);
            return state with { Phase = VehiclePhase.Charging, PendingTimer = null, DockChargeW = 0.0, DockChargeSince = context.Now };
        }

        var seconds = Math.Max(0.0, _vehicle.BatteryEnergyJ - state.BatteryJ) / dock.ChargingPowerW;
        context.Record(VehicleRecords.Charging, Severity.Info,
            RecordField.Of("battery_j", state.BatteryJ),
            RecordField.Of("charging_power_w", dock.ChargingPowerW),
            RecordField.Of("time_s", seconds));
        var handle = context.ScheduleSelf(SimDuration.FromSeconds(seconds), new VehicleCharged(), MissionPriority.Physics);
        return state with { Phase = VehiclePhase.Charging, PendingTimer = handle };
    }

    /// <summary>
    /// The probe's bus changed what the charger gets: the energy charged at the old power is booked, and the battery is
    /// expected full at the new power, or not at all while the charger is shed.
    /// </summary>
    private VehicleState OnDockPower(VehicleState state, DockPower power, ComponentContext context)
    {
        if (state.Phase != VehiclePhase.Charging) return state;
        var gainedJ = Math.Min(state.DockChargeW * (context.Now - state.DockChargeSince).TotalSeconds, Math.Max(0.0, _vehicle.BatteryEnergyJ - state.BatteryJ));
        if (state.PendingTimer is { } timer) context.Cancel(timer);
        state = state with
        {
            BatteryJ = state.BatteryJ + gainedJ,
            EnergyChargedJ = state.EnergyChargedJ + gainedJ,
            DockChargeW = power.PowerW,
            DockChargeSince = context.Now,
            PendingTimer = null,
        };
        context.Record(VehicleRecords.DockPower, Severity.Info,
            RecordField.Of("granted_w", power.PowerW),
            RecordField.Of("battery_j", state.BatteryJ));
        if (power.PowerW <= 0) return state;
        var seconds = Math.Max(0.0, _vehicle.BatteryEnergyJ - state.BatteryJ) / power.PowerW;
        return state with { PendingTimer = context.ScheduleSelf(SimDuration.FromSeconds(seconds), new VehicleCharged(), MissionPriority.Physics) };
    }

    /// <summary>Gives the probe's bus its power back when the charger stops drawing.</summary>
    private void ReleaseDock(VehicleState state, ComponentContext context)
    {
        if (_dockOnProbeBus && state.Phase == VehiclePhase.Charging)
        {
            context.Schedule(_ids.Probe, SimDuration.Zero, new DockLoad(_vehicle.Name, 0.0), MissionPriority.Command);
        }
    }

    private VehicleState Charged(VehicleState state, ComponentContext context)
    {
        if (state.Phase != VehiclePhase.Charging) return state;
        ReleaseDock(state, context);
        var charged = _vehicle.BatteryEnergyJ - state.BatteryJ;
        state = state with
        {
            Phase = VehiclePhase.Working,
            BatteryJ = _vehicle.BatteryEnergyJ,
            EnergyChargedJ = state.EnergyChargedJ + Math.Max(0.0, charged),
            Sortie = state.Sortie + 1,
            LegIndex = 0,
            Position = OceanVector.Zero,
        };
        if (state.Recalled) return Finish(state, "recalled", context);
        context.Record(VehicleRecords.Sortie, Severity.Notice,
            RecordField.Of("sortie", state.Sortie),
            RecordField.Of("battery_j", state.BatteryJ),
            RecordField.Of("energy_charged_j", state.EnergyChargedJ));
        return NextTaskLeg(state, context);
    }

    // ---- ends ------------------------------------------------------------------------------------------------------

    private VehicleState Finish(VehicleState state, string reason, ComponentContext context)
    {
        ReleaseDock(state, context);
        context.Record(VehicleRecords.TaskComplete, Severity.Notice,
            RecordField.Of("reason", reason),
            RecordField.Of("profiles", state.ProfilesCompleted),
            RecordField.Of("battery_j", state.BatteryJ));
        RecordEnergy(state, context);
        context.Schedule(_ids.Probe, SimDuration.Zero,
            new VehicleFinished(_vehicle.Name, reason, state.ProfilesCompleted, state.BatteryJ), MissionPriority.Command);
        return Stop(state, context);
    }

    private VehicleState Lost(VehicleState state, string reason, ComponentContext context)
    {
        ReleaseDock(state, context);
        state = Interrupt(state, context);
        var held = state.Link.Held;
        context.Record(VehicleRecords.Lost, Severity.Critical,
            RecordField.Of("reason", reason),
            RecordField.Of("battery_j", Math.Max(0.0, state.BatteryJ)),
            RecordField.Of("range_m", state.Position.Length),
            RecordField.Of("east_m", state.Position.East),
            RecordField.Of("north_m", state.Position.North),
            RecordField.Of("down_m", state.Position.Down),
            RecordField.Of("profiles", state.ProfilesCompleted),
            RecordField.Of("data_lost", held));
        if (held > 0)
        {
            context.Record(VehicleRecords.DataLost, Severity.Alarm,
                RecordField.Of("messages", held),
                RecordField.Of("reason", "held aboard a lost vehicle"));
        }

        RecordEnergy(state, context);
        context.Schedule(_ids.Probe, SimDuration.Zero,
            new VehicleFinished(_vehicle.Name, reason, state.ProfilesCompleted, Math.Max(0.0, state.BatteryJ), Lost: true), MissionPriority.Command);
        return Stop(state, context);
    }

    /// <summary>The energy account, only for vehicles that use the extended model (the original log stays as it was).</summary>
    private void RecordEnergy(VehicleState state, ComponentContext context)
    {
        if (!_vehicle.UsesExtendedModel && _acoustics is null) return;
        context.Record(VehicleRecords.Energy, Severity.Info,
            RecordField.Of("initial_j", _vehicle.BatteryEnergyJ),
            RecordField.Of("used_j", state.EnergyUsedJ),
            RecordField.Of("charged_j", state.EnergyChargedJ),
            RecordField.Of("battery_j", state.BatteryJ),
            RecordField.Of("messages_produced", state.Link.Produced),
            RecordField.Of("messages_delivered", state.Link.Delivered),
            RecordField.Of("messages_held", state.Link.Held));
    }

    private static VehicleState Stop(VehicleState state, ComponentContext context)
    {
        if (state.PendingTimer is { } timer) context.Cancel(timer);
        if (state.PendingTick is { } tick) context.Cancel(tick);
        return state with { Phase = VehiclePhase.Done, Leg = null, Suspended = null, PendingTimer = null, PendingTick = null };
    }

    // ---- acoustic link ---------------------------------------------------------------------------------------------

    private VehicleState ArmTick(VehicleState state, ComponentContext context)
    {
        if (state.PendingTick is not null || state.Finished) return state;
        return state with { PendingTick = context.ScheduleSelf(SimDuration.FromSeconds(MessageIntervalS), new VehicleMessageDue(), MissionPriority.Telemetry) };
    }

    private VehicleState MessageDue(VehicleState state, ComponentContext context)
    {
        if (state.Finished) return state;
        if (state.Phase == VehiclePhase.Charging) return ArmTick(state, context);

        var position = PositionNow(state, context.Now);
        var range = position.Length;
        var budget = Link(state)?.At(range);
        var up = !state.Link.Faulted && (budget is null || budget.LinkUp);
        var link = state.Link with { Produced = state.Link.Produced + 1 };
        if (up)
        {
            if (!state.Link.Up)
            {
                context.Record(VehicleRecords.BackInRange, Severity.Notice,
                    RecordField.Of("range_m", range),
                    RecordField.Of("margin_db", budget?.MarginDb ?? double.NaN),
                    RecordField.Of("out_of_range_s", (context.Now - state.Link.DownSince!.Value).TotalSeconds),
                    RecordField.Of("delivered_held", link.Held),
                    RecordField.Of("nav_error_m", NavigationErrorM(state, context.Now)));
            }

            link = link with
            {
                Up = true,
                DownSince = null,
                Delivered = link.Delivered + link.Held + 1,
                Held = 0,
                LastFixAt = context.Now,
                WaterDistanceAtFixM = WaterDistanceNow(state, context.Now),
            };
            state = state with { Link = link };
            if (state.RecallHeld) state = DoRecall(state with { RecallHeld = false }, context);
            return ArmTick(state, context);
        }

        link = link with { Held = link.Held + 1 };
        if (state.Link.Up)
        {
            context.Record(VehicleRecords.OutOfRange, Severity.Warning,
                RecordField.Of("range_m", range),
                RecordField.Of("margin_db", budget?.MarginDb ?? double.NaN),
                RecordField.Of("max_range_m", Link(state)?.MaximumRangeM ?? double.NaN),
                RecordField.Of("cause", state.Link.Faulted ? "link fault" : "range"));
            link = link with { Up = false, DownSince = context.Now };
        }

        state = state with { Link = link };
        if ((context.Now - link.DownSince!.Value).TotalSeconds >= _vehicle.MaxOutOfRangeS)
        {
            return Lost(state, "out of acoustic range too long", context);
        }

        return ArmTick(state, context);
    }

    private VehicleAcousticLink? Link(VehicleState state) =>
        _acoustics is null ? null : VehicleAcousticLink.For(_acoustics, _scenario, Ocean(state),
            SeawaterPressureDepth.StandardOceanDepthM(OceanUnderShell.SeaPressurePa(state.BasePressurePa), ScenarioOcean.StandardGravityMPerS2));

    /// <summary>The water under the shell by TEOS-10, at the pressure the probe reported at release.</summary>
    private OceanUnderShell Ocean(VehicleState state) => ScenarioOcean.At(_scenario, state.BasePressurePa);

    /// <summary>One-sigma dead-reckoning error since the last fix, plus the drift of the current the vehicle does not know.</summary>
    private double NavigationErrorM(VehicleState state, SimTime now)
    {
        var elapsed = Math.Max(0.0, (now - state.Link.LastFixAt).TotalSeconds);
        var distance = Math.Max(0.0, WaterDistanceNow(state, now) - state.Link.WaterDistanceAtFixM);
        var nav = _vehicle.Navigation;
        var sigma = nav is null ? 0.0 : DeadReckoning.PositionSigmaM(0.0, nav.ErrorPerDistance, distance, nav.RandomWalkM2PerS, elapsed);
        return sigma + Math.Abs(DeadReckoning.UnmodelledCurrentErrorM(_vehicle.Current?.SpeedMPerS ?? 0.0, elapsed));
    }

    // ---- faults and commands ---------------------------------------------------------------------------------------

    private VehicleState FaultBegins(VehicleState state, FaultModel fault, FaultEffect.VehicleLoss loss, ComponentContext context)
    {
        if (state.Finished || !state.Released)
        {
            context.Record(VehicleRecords.FaultIgnored, Severity.Info, RecordField.Of("fault", fault.Name), RecordField.Of("reason", state.Finished ? "vehicle done" : "not yet released"));
            return state;
        }

        switch (loss.Cause)
        {
            case VehicleLossCause.Battery:
                var wasHeld = state.Leg is { Held: true };
                state = Interrupt(state, context);
                var left = state.BatteryJ * loss.RemainingFraction;
                context.Record(VehicleRecords.BatteryFailed, Severity.Alarm, RecordField.Of("fault", fault.Name), RecordField.Of("battery_before_j", state.BatteryJ), RecordField.Of("battery_j", left));
                state = state with { BatteryJ = left, EnergyUsedJ = state.EnergyUsedJ + (state.BatteryJ - left) };
                if (left <= 0) return Lost(state, "flat battery", context);
                if (wasHeld) return Hold(state, context);
                return state.Phase == VehiclePhase.Charging ? state : Resume(state, context);
            case VehicleLossCause.Entrapment when state.Phase == VehiclePhase.Charging:
                context.Record(VehicleRecords.FaultIgnored, Severity.Info, RecordField.Of("fault", fault.Name), RecordField.Of("reason", "in the dock"));
                return state;
            case VehicleLossCause.Entrapment:
                state = Interrupt(state, context);
                context.Record(VehicleRecords.Entrapped, Severity.Alarm, RecordField.Of("fault", fault.Name), RecordField.Of("down_m", state.Position.Down), RecordField.Of("battery_j", state.BatteryJ));
                return fault.DurationS is null ? Lost(state, "entrapped", context) : Hold(state, context);
            default:
                context.Record(VehicleRecords.LinkFault, Severity.Alarm, RecordField.Of("fault", fault.Name));
                return ArmTick(state with { Link = state.Link with { Faulted = true } }, context);
        }
    }

    private VehicleState FaultEnds(VehicleState state, FaultModel fault, FaultEffect.VehicleLoss loss, ComponentContext context)
    {
        if (state.Finished || !state.Released) return state;
        switch (loss.Cause)
        {
            case VehicleLossCause.Entrapment when state.Leg is { Held: true }:
                state = Interrupt(state, context);
                context.Record(VehicleRecords.Freed, Severity.Notice, RecordField.Of("fault", fault.Name), RecordField.Of("battery_j", state.BatteryJ));
                return state.Recalled || state.Phase == VehiclePhase.Returning ? StartHome(state with { Suspended = null }, "freed on the way home", context) : Resume(state, context);
            case VehicleLossCause.OutOfRange:
                context.Record(VehicleRecords.LinkRestored, Severity.Notice, RecordField.Of("fault", fault.Name));
                return state with { Link = state.Link with { Faulted = false } };
            default:
                return state;
        }
    }

    /// <summary>Held fast: no motion, the hotel load still drawn, until freed or flat.</summary>
    private VehicleState Hold(VehicleState state, ComponentContext context)
    {
        var hold = new PlannedLeg("entrapped", OceanVector.Zero, 0.0, 0.0, double.PositiveInfinity, _vehicle.HotelPowerW, 0.0, null, false);
        return StartLeg(state, hold, OceanVector.Zero, OceanVector.Zero, double.PositiveInfinity, home: false, context, held: true);
    }

    /// <summary>A recall goes out from the probe's modem: heard at once in contact, otherwise when contact returns.</summary>
    private VehicleState Recall(VehicleState state, Telecommand command, ComponentContext context)
    {
        context.Record(CommandRecords.Executed, Severity.Notice,
            RecordField.Of("command", command.Command.ToString()),
            RecordField.Of("origin", command.Origin),
            RecordField.Of("placement", command.Placement),
            RecordField.Of("issued_t_s", command.IssuedAt.SecondsSinceEpoch),
            RecordField.Of("latency_s", (context.Now - command.IssuedAt).TotalSeconds),
            RecordField.Of("vehicle_phase", state.Phase.ToString()));
        if (state.Finished || !state.Released || state.Recalled) return state;
        if (!state.Link.Up || state.Link.Faulted)
        {
            context.Record(VehicleRecords.CommandHeld, Severity.Warning, RecordField.Of("command", RecallCommand), RecordField.Of("reason", "out of acoustic contact"));
            return state with { RecallHeld = true };
        }

        return DoRecall(state, context);
    }

    private VehicleState DoRecall(VehicleState state, ComponentContext context)
    {
        context.Record(VehicleRecords.Recalled, Severity.Notice, RecordField.Of("phase", state.Phase.ToString()), RecordField.Of("range_m", PositionNow(state, context.Now).Length));
        state = state with { Recalled = true };
        if (state.Phase != VehiclePhase.Working || state.Leg is { Held: true }) return state;
        return StartHome(Interrupt(state, context) with { Suspended = null }, "recalled", context);
    }

    // ---- helpers ---------------------------------------------------------------------------------------------------

    private OceanVector Current => _vehicle.Current is { } c ? OceanVector.Horizontal(c.SpeedMPerS, c.DirectionRad) : OceanVector.Zero;

    private static OceanVector PositionNow(VehicleState state, SimTime now) =>
        state.Leg is { } leg ? leg.PositionAfter(Math.Min((now - leg.StartAt).TotalSeconds, leg.Seconds)) : state.Position;

    private static double WaterDistanceNow(VehicleState state, SimTime now) =>
        state.Leg is { } leg ? state.WaterDistanceM + (leg.WaterVelocity.Length * Math.Min((now - leg.StartAt).TotalSeconds, leg.Seconds)) : state.WaterDistanceM;

    private VehiclePerformance Performance(VehicleState state)
    {
        var needsWater = _vehicle.Kind == VehicleKind.Glider || _vehicle.Hull is not null;
        var density = needsWater ? Ocean(state).DensityKgPerM3 : double.NaN;
        return VehiclePerformance.For(_vehicle, density, _gravityMPerS2, state.BasePressurePa);
    }
}
