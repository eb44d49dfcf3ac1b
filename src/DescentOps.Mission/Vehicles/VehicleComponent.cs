using DescentOps.Engine.Components;
using DescentOps.Engine.Journaling;
using DescentOps.Mission.Messages;
using DescentOps.Primitives.Time;
using DescentOps.Scenarios.Model;

namespace DescentOps.Mission.Vehicles;

/// <summary>
/// A profiling vehicle: after release it runs down to its profile depth and back, again and again, paying
/// hotel and propulsion power for each leg, and stops when the next leg would eat into its reserve.
/// </summary>
public sealed class VehicleComponent : SimComponent<VehicleState>
{
    /// <summary>Slowest leg speed as a share of the nominal one, so that a wild draw cannot stall a leg forever.</summary>
    private const double MinimumSpeedShare = 0.2;

    private readonly VehicleModel _vehicle;

    public VehicleComponent(VehicleModel vehicle)
        : base(MissionIds.Vehicle(vehicle.Name), FailurePolicy.RestartFromLastState)
    {
        _vehicle = vehicle;
        NominalLegEnergyJ = (vehicle.HotelPowerW + vehicle.PropulsionPowerW) * vehicle.ProfileDepthM / vehicle.SpeedMPerS;
    }

    /// <summary>Energy of one leg at the nominal speed: what the vehicle budgets before it starts a profile.</summary>
    public double NominalLegEnergyJ { get; }

    public override VehicleState InitialState => new(false, false, false, _vehicle.BatteryEnergyJ, 0, 0.0);

    public override VehicleState Handle(VehicleState state, object message, ComponentContext context)
    {
        switch (message)
        {
            case RunStarted:
                return state;
            case ReleaseVehicle release when !state.Released:
                context.Record("vehicle.released", Severity.Notice,
                    RecordField.Of("interface_depth_m", release.InterfaceDepthM),
                    RecordField.Of("battery_j", state.BatteryJ));
                return StartLeg(state with { Released = true, Descending = true, InterfaceDepthM = release.InterfaceDepthM }, context);
            case VehicleLegDone leg:
                return EndLeg(state with { BatteryJ = state.BatteryJ - leg.EnergyJ }, context);
            default:
                throw new InvalidOperationException($"Vehicle {_vehicle.Name} cannot handle {message.GetType().Name}.");
        }
    }

    private VehicleState EndLeg(VehicleState state, ComponentContext context)
    {
        if (!state.Descending)
        {
            state = state with { ProfilesCompleted = state.ProfilesCompleted + 1 };
            context.Record("vehicle.profile", Severity.Info,
                RecordField.Of("profile", state.ProfilesCompleted),
                RecordField.Of("max_depth_below_ice_m", _vehicle.ProfileDepthM),
                RecordField.Of("battery_j", state.BatteryJ));
        }

        return StartLeg(state with { Descending = !state.Descending }, context);
    }

    private VehicleState StartLeg(VehicleState state, ComponentContext context)
    {
        var reserveJ = _vehicle.ReserveFraction * _vehicle.BatteryEnergyJ;
        // A profile is only started if both its legs fit above the reserve: the vehicle must be able to come back up.
        var needed = state.Descending ? 2 * NominalLegEnergyJ : NominalLegEnergyJ;
        if (state.BatteryJ - needed < reserveJ)
        {
            context.Record("vehicle.task_complete", Severity.Notice,
                RecordField.Of("reason", "battery at reserve"),
                RecordField.Of("profiles", state.ProfilesCompleted),
                RecordField.Of("battery_j", state.BatteryJ));
            context.Schedule(MissionIds.Probe, SimDuration.Zero,
                new VehicleFinished(_vehicle.Name, "battery at reserve", state.ProfilesCompleted, state.BatteryJ), MissionPriority.Command);
            return state with { Finished = true };
        }

        var speed = _vehicle.SpeedMPerS * Math.Max(MinimumSpeedShare, 1.0 + (_vehicle.SpeedVariation * context.Random.NextNormal(0.0, 1.0)));
        var seconds = _vehicle.ProfileDepthM / speed;
        var energy = (_vehicle.HotelPowerW + _vehicle.PropulsionPowerW) * seconds;
        context.ScheduleSelf(SimDuration.FromSeconds(seconds), new VehicleLegDone(energy), MissionPriority.Physics);
        return state;
    }
}
