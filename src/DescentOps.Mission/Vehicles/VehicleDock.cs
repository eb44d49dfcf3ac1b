using DescentOps.Engine.Components;
using DescentOps.Mission.Messages;
using DescentOps.Primitives.Time;
using DescentOps.Records;
using DescentOps.Records.Kinds;

namespace DescentOps.Mission.Vehicles;

/// <summary>
/// At the dock: the data held aboard is delivered, the vehicle ends its task or charges (by its own timer, or on the
/// probe's bus as the bus grants power) and goes out on its next sortie.
/// </summary>
public static class VehicleDock
{
    public static VehicleState Docked(VehicleDesign design, VehicleState state, ComponentContext context)
    {
        var vehicle = design.Vehicle;
        // At the dock the data goes over the dock's own connection, whatever the acoustic link is doing.
        var link = state.Link;
        state = state with { Link = link with { Delivered = link.Delivered + link.Held, Held = 0 } };
        context.Record(VehicleRecords.Docked, Severity.Notice,
            RecordField.Of("sortie", state.Sortie),
            RecordField.Of("battery_j", state.BatteryJ),
            RecordField.Of("data_delivered", link.Held),
            RecordField.Of("nav_error_m", design.NavigationErrorM(state, context.Now)));
        var dock = vehicle.Dock;
        if (state.Recalled) return VehicleEnds.Finish(design, state, "recalled", context);
        if (dock is null) return VehicleEnds.Finish(design, state, "back at the probe", context);
        if (state.Sortie >= dock.Sorties) return VehicleEnds.Finish(design, state, "all sorties flown", context);
        if (dock.ChargingPowerW <= 0) return VehicleEnds.Finish(design, state, "docked; no charging", context);

        if (design.DockOnProbeBus)
        {
            // The charger asks the probe's bus; charging starts when the bus grants it (DockPower).
            context.Record(VehicleRecords.Charging, Severity.Info,
                RecordField.Of("battery_j", state.BatteryJ),
                RecordField.Of("charging_power_w", dock.ChargingPowerW),
                RecordField.Of("fed_by", "probe bus"));
            context.Schedule(design.Ids.Probe, SimDuration.Zero, new DockLoad(vehicle.Name, dock.ChargingPowerW), MissionPriority.Command);
            return state with { Phase = VehiclePhase.Charging, PendingTimer = null, DockChargeW = 0.0, DockChargeSince = context.Now };
        }

        var seconds = Math.Max(0.0, vehicle.BatteryEnergyJ - state.BatteryJ) / dock.ChargingPowerW;
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
    public static VehicleState OnDockPower(VehicleDesign design, VehicleState state, DockPower power, ComponentContext context)
    {
        if (state.Phase != VehiclePhase.Charging) return state;
        var capacityJ = design.Vehicle.BatteryEnergyJ;
        var gainedJ = Math.Min(state.DockChargeW * (context.Now - state.DockChargeSince).TotalSeconds, Math.Max(0.0, capacityJ - state.BatteryJ));
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
        var seconds = Math.Max(0.0, capacityJ - state.BatteryJ) / power.PowerW;
        return state with { PendingTimer = context.ScheduleSelf(SimDuration.FromSeconds(seconds), new VehicleCharged(), MissionPriority.Physics) };
    }

    /// <summary>Gives the probe's bus its power back when the charger stops drawing.</summary>
    public static void ReleaseDock(VehicleDesign design, VehicleState state, ComponentContext context)
    {
        if (design.DockOnProbeBus && state.Phase == VehiclePhase.Charging)
        {
            context.Schedule(design.Ids.Probe, SimDuration.Zero, new DockLoad(design.Vehicle.Name, 0.0), MissionPriority.Command);
        }
    }

    /// <summary>The battery is full: the next sortie begins at the dock, unless a recall came meanwhile.</summary>
    public static VehicleState Charged(VehicleDesign design, VehicleState state, ComponentContext context)
    {
        if (state.Phase != VehiclePhase.Charging) return state;
        ReleaseDock(design, state, context);
        var charged = design.Vehicle.BatteryEnergyJ - state.BatteryJ;
        state = state with
        {
            Phase = VehiclePhase.Working,
            BatteryJ = design.Vehicle.BatteryEnergyJ,
            EnergyChargedJ = state.EnergyChargedJ + Math.Max(0.0, charged),
            Sortie = state.Sortie + 1,
            LegIndex = 0,
            Position = OceanVector.Zero,
        };
        if (state.Recalled) return VehicleEnds.Finish(design, state, "recalled", context);
        context.Record(VehicleRecords.Sortie, Severity.Notice,
            RecordField.Of("sortie", state.Sortie),
            RecordField.Of("battery_j", state.BatteryJ),
            RecordField.Of("energy_charged_j", state.EnergyChargedJ));
        return VehicleLegPlanner.NextTaskLeg(design, state, context);
    }
}
