using System.Collections.Immutable;
using DescentOps.Engine.Components;
using DescentOps.Records;
using DescentOps.Mission.Messages;
using DescentOps.Physics.Power;
using DescentOps.Primitives.Time;
using DescentOps.Records.Kinds;

namespace DescentOps.Mission.Probe;

/// <summary>
/// The probe's bus between events: reallocation for the instant (<see cref="PowerBus"/> by priority), the loads that
/// stop or start with why, and what each docked vehicle's charger is granted.
/// </summary>
public static class ProbeBusControl
{
    /// <summary>
    /// Reallocates the bus for the instant: the source as decayed and dipped, the turbine once in the ocean, the
    /// heaters' demands now, less what telecommands switched off. Every load that stops or starts is logged with why.
    /// </summary>
    public static ProbeState Rebus(ProbeDesign design, ProbeState state, ComponentContext context)
    {
        if (state.Bus is not { } bus) return state;
        var power = design.Power!;
        var head = ProbeHeaters.HeadDemandW(design, state);
        var wall = ProbeHeaters.WallDemandW(state);
        var jets = ProbeJets.LoadDemandW(design, state);
        var loads = power.Loads(head, wall, bus.SwitchedOff, state.DockDemandsW, jets);
        var allocation = power.Allocate(context.Now.SecondsSinceEpoch, state.PowerFraction, state.Regime == ProbeRegime.AtOcean, bus.StateOfCharge, bus.BatteryLockedOut, loads);
        var isStart = bus.Allocation.Loads.Running.Count == 0 && bus.Allocation.Loads.Shed.Count == 0;
        foreach (var model in power.LoadModels)
        {
            var wasOff = isStart ? null : OffCause(bus.Allocation, model.Name);
            var isOff = OffCause(allocation, model.Name);
            if (wasOff == isOff) continue;
            var demandW = power.Loads(head, wall, ImmutableSortedSet<string>.Empty, null, jets).Single(l => l.Name == model.Name).PowerW;
            context.Record(isOff is null ? ProbeRecords.LoadRestored : ProbeRecords.LoadShed, isOff is null ? Severity.Notice : Severity.Warning,
                RecordField.Of("load", model.Name),
                RecordField.Of("priority", model.Priority),
                RecordField.Of("demand_w", demandW),
                RecordField.Of("available_w", allocation.AvailablePowerW),
                RecordField.Of("battery_soc", bus.StateOfCharge),
                RecordField.Of("cause", isOff ?? wasOff ?? ""));
        }

        return Redock(design, state with { Bus = bus with { Allocation = allocation } }, context);
    }

    /// <summary>Tells each docked vehicle when what the bus gives its charger changes: its request while the load runs, else nothing.</summary>
    private static ProbeState Redock(ProbeDesign design, ProbeState state, ComponentContext context)
    {
        var granted = state.DockGrantedW;
        foreach (var (vehicle, demandW) in state.DockDemandsW)
        {
            var powerW = ProbeHeaters.IsRunning(state.Bus!, ProbePowerSystem.DockLoadName(vehicle)) ? demandW : 0.0;
            if (granted.TryGetValue(vehicle, out var before) && before == powerW) continue;
            context.Record(ProbeRecords.DockPower, Severity.Info,
                RecordField.Of("vehicle", vehicle),
                RecordField.Of("request_w", demandW),
                RecordField.Of("granted_w", powerW),
                RecordField.Of("available_w", state.Bus!.Allocation.AvailablePowerW));
            context.Schedule(design.Ids.Vehicle(vehicle), SimDuration.Zero, new DockPower(powerW), MissionPriority.Command);
            granted = granted.SetItem(vehicle, powerW);
        }

        foreach (var gone in granted.Keys.Where(v => !state.DockDemandsW.ContainsKey(v)).ToList()) granted = granted.Remove(gone);
        return state with { DockGrantedW = granted };
    }

    /// <summary>
    /// Why a load gets no power under an allocation: "bus" when it was shed, "command" when it was switched off (a
    /// switched-off load asks for nothing, so it is in neither list); null when it runs.
    /// </summary>
    public static string? OffCause(BusAllocation allocation, string load) =>
        allocation.Loads.Shed.Any(l => l.Name == load) ? "bus"
        : allocation.Loads.Running.Any(l => l.Name == load) ? null
        : "command";

    /// <summary>The power system as the run starts: source, battery, loads by priority.</summary>
    public static void RecordPowerSystem(ProbeDesign design, ProbeState state, ComponentContext context)
    {
        if (design.Power is not { } power) return;
        context.Record(ProbeRecords.Power, Severity.Info,
            RecordField.Of("source", power.SourceKind.ToString()),
            RecordField.Of("source_power_w", power.SourcePowerW(0.0)),
            RecordField.Of("source_thermal_power_w", power.SourceThermalPowerW(0.0)),
            RecordField.Of("battery_capacity_j", power.Battery?.EffectiveCapacityJ ?? 0.0),
            RecordField.Of("battery_soc", state.Bus!.StateOfCharge),
            RecordField.Of("loads", string.Join(", ", power.LoadModels.Select(l => $"{l.Name}:{l.Priority}"))));
        if (!design.Power!.HeatsProbe) return;
        var waste = design.Power.WasteHeat(0.0);
        context.Record(ProbeRecords.HeatPath, Severity.Info,
            RecordField.Of("waste_heat_to_head_w", waste.HeadW),
            RecordField.Of("waste_heat_to_wall_w", waste.WallW),
            RecordField.Of("waste_heat_rejected_w", waste.RejectedW));
    }
}
