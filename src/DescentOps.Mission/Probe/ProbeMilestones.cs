using DescentOps.Engine.Components;
using DescentOps.Records;
using DescentOps.Engine.Running;
using DescentOps.Mission.Messages;
using DescentOps.Primitives.Time;
using DescentOps.Records.Kinds;

namespace DescentOps.Mission.Probe;

/// <summary>The mission's milestones at the probe: the crossing into the ocean with the vehicles' release, and the end once every vehicle is back or lost.</summary>
public static class ProbeMilestones
{
    public static ProbeState Breakthrough(ProbeDesign design, ProbeState state, ComponentContext context)
    {
        var vehicles = design.Scenario.Vehicles;
        context.Record(ProbeRecords.Breakthrough, Severity.Notice,
            RecordField.Of("depth_m", state.DepthM),
            RecordField.Of("energy_used_j", state.EnergyUsedJ),
            RecordField.Of("vehicles", vehicles.Count));
        foreach (var vehicle in vehicles)
        {
            context.Schedule(design.Ids.Vehicle(vehicle.Name), SimDuration.Zero, new ReleaseVehicle(state.DepthM, design.Descent.Shell.BasePressurePa, design.Descent.Shell.BaseTemperatureK), MissionPriority.Command);
        }

        if (vehicles.Count == 0)
        {
            context.StopRun(RunOutcomeKind.Completed, "the probe reached the ocean; no vehicles to release");
        }

        state = ProbeRegimeMachine.ChangeRegime(state, ProbeRegime.AtOcean, context, "breakthrough into the ocean");
        return state with
        {
            BreakthroughAt = context.Now,
            VehiclesActive = vehicles.Count,
            NextFrameAt = context.Now,
            WallDeficit = false,
        };
    }

    /// <summary>A vehicle is done (the state is already advanced to now); the last one ends the run.</summary>
    public static ProbeState VehicleFinished(ProbeDesign design, ProbeState state, VehicleFinished finished, ComponentContext context)
    {
        var next = state with
        {
            VehiclesActive = state.VehiclesActive - 1,
            VehiclesFinished = state.VehiclesFinished + (finished.Lost ? 0 : 1),
            VehiclesLost = state.VehiclesLost + (finished.Lost ? 1 : 0),
        };
        if (next.VehiclesFinished + next.VehiclesLost < design.Scenario.Vehicles.Count) return next;

        // Older logs carry no vehicles_lost field: it is written only when a vehicle was lost.
        RecordField[] fields = next.VehiclesLost > 0
            ? [RecordField.Of("vehicles_finished", next.VehiclesFinished), RecordField.Of("energy_used_j", next.EnergyUsedJ), RecordField.Of("vehicles_lost", next.VehiclesLost)]
            : [RecordField.Of("vehicles_finished", next.VehiclesFinished), RecordField.Of("energy_used_j", next.EnergyUsedJ)];
        context.Record(ProbeRecords.MissionComplete, Severity.Notice, fields);
        context.StopRun(next.VehiclesFinished == 0 ? RunOutcomeKind.MissionLost : RunOutcomeKind.Completed, VehicleTally.Reason(next.VehiclesFinished, next.VehiclesLost));

        return next;
    }
}
