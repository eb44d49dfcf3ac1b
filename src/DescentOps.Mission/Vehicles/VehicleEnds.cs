using DescentOps.Engine.Components;
using DescentOps.Mission.Messages;
using DescentOps.Primitives.Time;
using DescentOps.Records;
using DescentOps.Records.Kinds;

namespace DescentOps.Mission.Vehicles;

/// <summary>How a vehicle's work ends: its task complete, or the vehicle lost with the data held aboard; the probe is told either way.</summary>
public static class VehicleEnds
{
    public static VehicleState Finish(VehicleDesign design, VehicleState state, string reason, ComponentContext context)
    {
        VehicleDock.ReleaseDock(design, state, context);
        context.Record(VehicleRecords.TaskComplete, Severity.Notice,
            RecordField.Of("reason", reason),
            RecordField.Of("profiles", state.ProfilesCompleted),
            RecordField.Of("battery_j", state.BatteryJ));
        RecordEnergy(design, state, context);
        context.Schedule(design.Ids.Probe, SimDuration.Zero,
            new VehicleFinished(design.Vehicle.Name, reason, state.ProfilesCompleted, state.BatteryJ), MissionPriority.Command);
        return Stop(state, context);
    }

    public static VehicleState Lost(VehicleDesign design, VehicleState state, string reason, ComponentContext context)
    {
        VehicleDock.ReleaseDock(design, state, context);
        state = VehicleLegs.Interrupt(state, context);
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

        RecordEnergy(design, state, context);
        context.Schedule(design.Ids.Probe, SimDuration.Zero,
            new VehicleFinished(design.Vehicle.Name, reason, state.ProfilesCompleted, Math.Max(0.0, state.BatteryJ), Lost: true), MissionPriority.Command);
        return Stop(state, context);
    }

    /// <summary>The energy account, only for vehicles that use the extended model (the original log stays as it was).</summary>
    private static void RecordEnergy(VehicleDesign design, VehicleState state, ComponentContext context)
    {
        if (!design.Vehicle.UsesExtendedModel && design.Acoustics is null) return;
        context.Record(VehicleRecords.Energy, Severity.Info,
            RecordField.Of("initial_j", design.Vehicle.BatteryEnergyJ),
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
}
