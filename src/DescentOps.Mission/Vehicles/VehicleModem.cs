using DescentOps.Engine.Components;
using DescentOps.Primitives.Time;
using DescentOps.Records;
using DescentOps.Records.Kinds;

namespace DescentOps.Mission.Vehicles;

/// <summary>
/// The vehicle's data messages over the acoustic link, one every interval: delivered with everything held while the
/// link closes, held aboard while it does not; out of and back in range logged at the first message that fails or gets
/// through, and the vehicle lost after too long out of contact.
/// </summary>
public static class VehicleModem
{
    public static VehicleState ArmTick(VehicleDesign design, VehicleState state, ComponentContext context)
    {
        if (state.PendingTick is not null || state.Finished) return state;
        return state with { PendingTick = context.ScheduleSelf(SimDuration.FromSeconds(design.MessageIntervalS), new VehicleMessageDue(), MissionPriority.Telemetry) };
    }

    public static VehicleState MessageDue(VehicleDesign design, VehicleState state, ComponentContext context)
    {
        if (state.Finished) return state;
        if (state.Phase == VehiclePhase.Charging) return ArmTick(design, state, context);

        var position = VehicleLegs.PositionNow(state, context.Now);
        var range = position.Length;
        var budget = design.Link(state)?.At(range);
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
                    RecordField.Of("nav_error_m", design.NavigationErrorM(state, context.Now)));
            }

            link = link with
            {
                Up = true,
                DownSince = null,
                Delivered = link.Delivered + link.Held + 1,
                Held = 0,
                LastFixAt = context.Now,
                WaterDistanceAtFixM = VehicleLegs.WaterDistanceNow(state, context.Now),
            };
            state = state with { Link = link };
            if (state.RecallHeld) state = VehicleRecall.DoRecall(design, state with { RecallHeld = false }, context);
            return ArmTick(design, state, context);
        }

        link = link with { Held = link.Held + 1 };
        if (state.Link.Up)
        {
            context.Record(VehicleRecords.OutOfRange, Severity.Warning,
                RecordField.Of("range_m", range),
                RecordField.Of("margin_db", budget?.MarginDb ?? double.NaN),
                RecordField.Of("max_range_m", design.Link(state)?.MaximumRangeM ?? double.NaN),
                RecordField.Of("cause", state.Link.Faulted ? "link fault" : "range"));
            link = link with { Up = false, DownSince = context.Now };
        }

        state = state with { Link = link };
        if ((context.Now - link.DownSince!.Value).TotalSeconds >= design.Vehicle.MaxOutOfRangeS)
        {
            return VehicleEnds.Lost(design, state, "out of acoustic range too long", context);
        }

        return ArmTick(design, state, context);
    }
}
