using DescentOps.Engine.Components;
using DescentOps.Records;
using DescentOps.Records.Kinds;
using DescentOps.Scenarios.Model;

namespace DescentOps.Mission.Vehicles;

/// <summary>
/// A vehicle loss by its cause: a failing battery keeps a share of its charge, an entrapment holds the vehicle (for
/// good without a duration), a dead link holds the data aboard until the fault clears. A vehicle not yet out or
/// already done ignores it.
/// </summary>
public static class VehicleFaults
{
    public static VehicleState Begins(VehicleDesign design, VehicleState state, string fault, FaultEffect.VehicleLoss loss, double? durationS, ComponentContext context)
    {
        if (state.Finished || !state.Released)
        {
            context.Record(VehicleRecords.FaultIgnored, Severity.Info, RecordField.Of("fault", fault), RecordField.Of("reason", state.Finished ? "vehicle done" : "not yet released"));
            return state;
        }

        switch (loss.Cause)
        {
            case VehicleLossCause.Battery:
                var wasHeld = state.Leg is { Held: true };
                state = VehicleLegs.Interrupt(state, context);
                var left = state.BatteryJ * loss.RemainingFraction;
                context.Record(VehicleRecords.BatteryFailed, Severity.Alarm, RecordField.Of("fault", fault), RecordField.Of("battery_before_j", state.BatteryJ), RecordField.Of("battery_j", left));
                state = state with { BatteryJ = left, EnergyUsedJ = state.EnergyUsedJ + (state.BatteryJ - left) };
                if (left <= 0) return VehicleEnds.Lost(design, state, "flat battery", context);
                if (wasHeld) return VehicleLegs.Hold(design, state, context);
                return state.Phase == VehiclePhase.Charging ? state : VehicleLegs.Resume(state, context);
            case VehicleLossCause.Entrapment when state.Phase == VehiclePhase.Charging:
                context.Record(VehicleRecords.FaultIgnored, Severity.Info, RecordField.Of("fault", fault), RecordField.Of("reason", "in the dock"));
                return state;
            case VehicleLossCause.Entrapment:
                state = VehicleLegs.Interrupt(state, context);
                context.Record(VehicleRecords.Entrapped, Severity.Alarm, RecordField.Of("fault", fault), RecordField.Of("down_m", state.Position.Down), RecordField.Of("battery_j", state.BatteryJ));
                return durationS is null ? VehicleEnds.Lost(design, state, "entrapped", context) : VehicleLegs.Hold(design, state, context);
            case VehicleLossCause.OutOfRange:
                context.Record(VehicleRecords.LinkFault, Severity.Alarm, RecordField.Of("fault", fault));
                return VehicleModem.ArmTick(design, state with { Link = state.Link with { Faulted = true } }, context);
            default:
                throw new System.Diagnostics.UnreachableException($"Vehicle loss cause {loss.Cause} has no effect.");
        }
    }

    public static VehicleState Ends(VehicleDesign design, VehicleState state, string fault, FaultEffect.VehicleLoss loss, ComponentContext context)
    {
        if (state.Finished || !state.Released) return state;
        switch (loss.Cause)
        {
            case VehicleLossCause.Entrapment when state.Leg is { Held: true }:
                state = VehicleLegs.Interrupt(state, context);
                context.Record(VehicleRecords.Freed, Severity.Notice, RecordField.Of("fault", fault), RecordField.Of("battery_j", state.BatteryJ));
                return state.Recalled || state.Phase == VehiclePhase.Returning
                    ? VehicleLegPlanner.StartHome(design, state with { Suspended = null }, "freed on the way home", context)
                    : VehicleLegs.Resume(state, context);
            case VehicleLossCause.OutOfRange:
                context.Record(VehicleRecords.LinkRestored, Severity.Notice, RecordField.Of("fault", fault));
                return state with { Link = state.Link with { Faulted = false } };
            default:
                return state;
        }
    }
}
