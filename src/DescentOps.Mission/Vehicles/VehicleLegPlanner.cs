using DescentOps.Engine.Components;
using DescentOps.Records;
using DescentOps.Records.Kinds;
using DescentOps.Scenarios.Model;

namespace DescentOps.Mission.Vehicles;

/// <summary>
/// Which leg comes next: the task's next leg at a drawn speed while the battery allows, else home to the dock by the
/// battery rule (<see cref="DockRule"/>) or, without a dock, the end at the reserve; and a leg's end, with its profile
/// or cycle counted.
/// </summary>
public static class VehicleLegPlanner
{
    /// <summary>Slowest leg speed as a share of the nominal one, so that a wild draw cannot stall a leg forever.</summary>
    public const double MinimumSpeedShare = 0.2;

    public static VehicleState NextTaskLeg(VehicleDesign design, VehicleState state, ComponentContext context)
    {
        var vehicle = design.Vehicle;
        var performance = design.Performance(state);
        var plan = VehicleTaskPlan.Leg(performance, state.Cycle, state.LegIndex, state.Position);
        if (vehicle.Dock is { } dock)
        {
            var end = VehicleLegs.EndOf(state.Position, plan, plan.WaterVelocity, plan.SecondsAt(1.0));
            var home = performance.CruiseEnergyJ(end.Length, end.Down);
            if (DockRule.ReturnReason(state.BatteryJ, vehicle.BatteryEnergyJ, dock.ReturnAtFraction, vehicle.ReserveFraction, plan.NominalEnergyJ, home) is { } reason)
            {
                return StartHome(design, state, reason, context);
            }
        }
        else if (state.BatteryJ - RestOfCycleEnergyJ(design, performance, state) < vehicle.ReserveFraction * vehicle.BatteryEnergyJ)
        {
            // A cycle is only started (or carried on) if what is left of it fits above the reserve.
            return VehicleEnds.Finish(design, state, "battery at reserve", context);
        }

        var share = Math.Max(MinimumSpeedShare, 1.0 + (vehicle.SpeedVariation * context.Random.NextNormal(0.0, 1.0)));
        var water = plan.WaterVelocity * share;
        return VehicleLegs.Start(state, plan, water, water + design.Current, plan.SecondsAt(share), home: false, context);
    }

    public static VehicleState StartHome(VehicleDesign design, VehicleState state, string reason, ComponentContext context)
    {
        var performance = design.Performance(state);
        var plan = VehicleTaskPlan.Home(performance, state.Position);
        var toDock = state.Position * -1.0;
        var closing = HomingSpeed.ClosingSpeedMPerS(performance.CruiseSpeedMPerS, design.Current, toDock);
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
        if (distance <= 0) return VehicleDock.Docked(design, state, context);
        var seconds = closing > 0 ? distance / closing : double.PositiveInfinity;
        if (!double.IsFinite(seconds) && plan.PowerW <= 0) return VehicleEnds.Lost(design, state, "cannot make headway against the current", context);
        return VehicleLegs.Start(state, plan, ground - design.Current, ground, seconds, home: true, context);
    }

    /// <summary>The leg under way is over: it is committed whole, and the vehicle docks or takes the task's next leg.</summary>
    public static VehicleState EndLeg(VehicleDesign design, VehicleState state, ComponentContext context)
    {
        var vehicle = design.Vehicle;
        var leg = state.Leg!;
        state = state with
        {
            BatteryJ = leg.StartBatteryJ - ((leg.PowerW * leg.Seconds) + leg.EndEnergyJ),
            Position = VehicleLegs.EndOf(leg.StartPosition, leg.Plan, leg.GroundVelocity, leg.Seconds),
            WaterDistanceM = state.WaterDistanceM + (leg.WaterVelocity.Length * leg.Seconds),
            EnergyUsedJ = state.EnergyUsedJ + (leg.PowerW * leg.Seconds) + leg.EndEnergyJ,
            Leg = null,
            PendingTimer = null,
        };
        if (leg.Home) return VehicleDock.Docked(design, state with { Position = OceanVector.Zero }, context);

        if (leg.Plan.EndsCycle)
        {
            state = state with { ProfilesCompleted = state.ProfilesCompleted + 1 };
            if (vehicle.Task == VehicleTask.WaterColumn)
            {
                context.Record(VehicleRecords.Profile, Severity.Info,
                    RecordField.Of("profile", state.ProfilesCompleted),
                    RecordField.Of("max_depth_below_ice_m", vehicle.ProfileDepthM),
                    RecordField.Of("battery_j", state.BatteryJ));
            }
            else
            {
                context.Record(VehicleRecords.Cycle, Severity.Info,
                    RecordField.Of("task", vehicle.Task.ToString()),
                    RecordField.Of("cycle", state.ProfilesCompleted),
                    RecordField.Of("battery_j", state.BatteryJ));
            }
        }

        var next = state.LegIndex + 1;
        var wraps = next == VehicleTaskPlan.LegsPerCycle(vehicle.Task);
        return NextTaskLeg(design, state with { LegIndex = wraps ? 0 : next, Cycle = wraps ? state.Cycle + 1 : state.Cycle }, context);
    }

    private static double RestOfCycleEnergyJ(VehicleDesign design, VehiclePerformance performance, VehicleState state)
    {
        var total = 0.0;
        var at = state.Position;
        for (var leg = state.LegIndex; leg < VehicleTaskPlan.LegsPerCycle(design.Vehicle.Task); leg++)
        {
            var plan = VehicleTaskPlan.Leg(performance, state.Cycle, leg, at);
            total += plan.NominalEnergyJ;
            at = VehicleLegs.EndOf(at, plan, plan.WaterVelocity, plan.SecondsAt(1.0));
        }

        return total;
    }
}
