using DescentOps.Engine.Components;
using DescentOps.Primitives.Time;

namespace DescentOps.Mission.Vehicles;

/// <summary>
/// A leg under way: starting one, arming its timer, committing it up to now when something interrupts it, taking it up
/// again, and where the vehicle is meanwhile. A leg is committed only at its end or at an interruption, so the figures
/// at its end come from the planned leg, not from the rounding of event times.
/// </summary>
public static class VehicleLegs
{
    public static VehicleState Start(VehicleState state, PlannedLeg plan, OceanVector water, OceanVector ground, double seconds, bool home, ComponentContext context, bool held = false)
    {
        var leg = new VehicleLeg(plan, context.Now, state.Position, state.BatteryJ, water, ground, plan.PowerW, seconds, plan.EndEnergyJ, home, held);
        return Schedule(state with { Leg = leg }, context);
    }

    /// <summary>Held fast: no motion, the hotel load still drawn, until freed or flat.</summary>
    public static VehicleState Hold(VehicleDesign design, VehicleState state, ComponentContext context)
    {
        var hold = new PlannedLeg("entrapped", OceanVector.Zero, 0.0, 0.0, double.PositiveInfinity, design.Vehicle.HotelPowerW, 0.0, null, false);
        return Start(state, hold, OceanVector.Zero, OceanVector.Zero, double.PositiveInfinity, home: false, context, held: true);
    }

    /// <summary>Arms the timer of the leg under way: its end, or the instant its battery runs flat if that comes first.</summary>
    public static VehicleState Schedule(VehicleState state, ComponentContext context)
    {
        var leg = state.Leg!;
        var energy = (leg.PowerW * leg.Seconds) + leg.EndEnergyJ;
        var empty = !(energy <= leg.StartBatteryJ);
        var seconds = empty ? (leg.PowerW > 0 ? Math.Min(leg.StartBatteryJ / leg.PowerW, leg.Seconds) : leg.Seconds) : leg.Seconds;
        if (!double.IsFinite(seconds)) return state;
        var handle = context.ScheduleSelf(SimDuration.FromSeconds(seconds), new VehicleLegDone(empty), MissionPriority.Physics);
        return state with { PendingTimer = handle };
    }

    /// <summary>A leg's end point; a vertical leg ends at its target depth exactly, whatever the rounding of its run.</summary>
    public static OceanVector EndOf(OceanVector start, PlannedLeg plan, OceanVector velocity, double seconds)
    {
        var end = start + (velocity * seconds);
        return plan.TargetDownM is { } down ? end with { Down = down } : end;
    }

    /// <summary>Commits the leg under way up to now (an interruption), leaving the rest of it as <see cref="VehicleState.Suspended"/>.</summary>
    public static VehicleState Interrupt(VehicleState state, ComponentContext context)
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
    public static VehicleState Resume(VehicleState state, ComponentContext context)
    {
        if (state.Suspended is not { } rest) return state;
        var leg = rest with { StartAt = context.Now, StartPosition = state.Position, StartBatteryJ = state.BatteryJ };
        return Schedule(state with { Leg = leg, Suspended = null }, context);
    }

    public static OceanVector PositionNow(VehicleState state, SimTime now) =>
        state.Leg is { } leg ? leg.PositionAfter(Math.Min((now - leg.StartAt).TotalSeconds, leg.Seconds)) : state.Position;

    public static double WaterDistanceNow(VehicleState state, SimTime now) =>
        state.Leg is { } leg ? state.WaterDistanceM + (leg.WaterVelocity.Length * Math.Min((now - leg.StartAt).TotalSeconds, leg.Seconds)) : state.WaterDistanceM;
}
