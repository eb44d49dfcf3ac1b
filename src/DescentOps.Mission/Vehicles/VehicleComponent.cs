using DescentOps.Engine.Components;
using DescentOps.Mission.Messages;
using DescentOps.Records;
using DescentOps.Records.Kinds;
using DescentOps.Scenarios.Model;

namespace DescentOps.Mission.Vehicles;

/// <summary>
/// A vehicle released at breakthrough. It flies its task's legs (<see cref="VehicleLegPlanner"/>, <see cref="VehicleLegs"/>)
/// at the speed and power its kind gives (<see cref="VehiclePerformance"/>), drifting with the current. Without a dock
/// it works until its reserve and stops; with one it turns home by the scenario's battery rule (<see cref="DockRule"/>),
/// recharges and goes out again (<see cref="VehicleDock"/>). With an acoustic link it sends a data message every
/// interval, keeps what does not get through and delivers it when contact returns (<see cref="VehicleModem"/>). It is
/// lost when its battery runs flat, when it is entrapped for good, or when it has been out of contact too long
/// (<see cref="VehicleEnds"/>); the log says which. This class only dispatches messages to those parts.
/// </summary>
public sealed class VehicleComponent : SimComponent<VehicleState>
{
    public const string RecallCommand = VehicleRecall.Command;

    public VehicleComponent(VehicleModel vehicle, Scenario scenario, LanderIds? ids = null)
        : base((ids ?? LanderIds.Single).Vehicle(vehicle.Name), FailurePolicy.RestartFromLastState)
    {
        Design = new VehicleDesign(vehicle, scenario, ids ?? LanderIds.Single);
    }

    public VehicleDesign Design { get; }

    public override VehicleState InitialState => new(
        VehiclePhase.Stowed, Design.Vehicle.BatteryEnergyJ, OceanVector.Zero, null, null, 0, 0, 0, 1, 0.0, 0.0, 273.15, 0.0, 0.0, 0.0,
        VehicleLinkState.Initial, false, false, null, null);

    public override VehicleState Handle(VehicleState state, object message, ComponentContext context)
    {
        var d = Design;
        switch (message)
        {
            case RunStarted:
                return state;
            case ReleaseVehicle release when !state.Released:
                return Release(state, release, context);
            case VehicleLegDone done when state.Leg is not null:
                return done.BatteryEmpty
                    ? VehicleEnds.Lost(d, state, state.Leg.Held ? "flat battery while entrapped" : "flat battery", context)
                    : VehicleLegPlanner.EndLeg(d, state, context);
            case VehicleCharged:
                return VehicleDock.Charged(d, state with { PendingTimer = null }, context);
            case DockPower power:
                return VehicleDock.OnDockPower(d, state, power, context);
            case VehicleMessageDue:
                return VehicleModem.MessageDue(d, state with { PendingTick = null }, context);
            case FaultStarted { Fault.Effect: FaultEffect.VehicleLoss loss } fault:
                return VehicleFaults.Begins(d, state, fault.Fault.Name, loss, fault.Fault.DurationS, context);
            case FaultCleared { Fault.Effect: FaultEffect.VehicleLoss loss } fault:
                return VehicleFaults.Ends(d, state, fault.Fault.Name, loss, context);
            case Telecommand { Command.Command: RecallCommand } command:
                return VehicleRecall.Recall(d, state, command, context);
            default:
                throw new InvalidOperationException($"Vehicle {d.Vehicle.Name} cannot handle {message.GetType().Name}.");
        }
    }

    /// <summary>Out of the probe at breakthrough: the link's budget and the vehicle's performance are logged, then its first leg.</summary>
    private VehicleState Release(VehicleState state, ReleaseVehicle release, ComponentContext context)
    {
        var d = Design;
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
        if (d.Acoustics is not null)
        {
            var link = d.Link(state)!;
            context.Record(VehicleRecords.AcousticLink, Severity.Info,
                RecordField.Of("frequency_hz", d.Acoustics.FrequencyHz),
                RecordField.Of("absorption_db_per_km", link.Link.AbsorptionDbPerKm),
                RecordField.Of("earth_equivalent_depth_m", link.EarthEquivalentDepthM),
                RecordField.Of("sound_speed_m_s", link.SoundSpeedMPerS),
                RecordField.Of("max_range_m", link.MaximumRangeM));
            state = VehicleModem.ArmTick(d, state, context);
        }

        if (d.Vehicle.UsesExtendedModel)
        {
            var performance = d.Performance(state);
            context.Record(VehicleRecords.Performance, Severity.Info,
                RecordField.Of("kind", d.Vehicle.Kind.ToString()),
                RecordField.Of("task", d.Vehicle.Task.ToString()),
                RecordField.Of("cruise_speed_m_s", performance.CruiseSpeedMPerS),
                RecordField.Of("moving_power_w", performance.MovingPowerW),
                RecordField.Of("energy_per_km_j", performance.CruiseEnergyJ(1000.0, 0.0)),
                RecordField.Of("glide_path_angle_rad", performance.Glide?.GlidePathAngleRad ?? 0.0));
        }

        return VehicleLegPlanner.NextTaskLeg(d, state, context);
    }
}
