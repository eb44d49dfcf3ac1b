using DescentOps.Engine.Components;
using DescentOps.Records;
using DescentOps.Mission.Autonomy;
using DescentOps.Mission.Messages;
using DescentOps.Primitives.Time;
using DescentOps.Records.Kinds;

namespace DescentOps.Mission.Probe;

/// <summary>
/// Telecommands the probe carries out. Set points are what the heaters are asked for; a power dip still scales what
/// they get. Safe mode stops the head (and the jets: a paused probe runs no jets) and runs the wall heaters at their
/// maximum to keep the water gap open. The jets' commands change their heat and hole radius; the next retune logs the
/// operating point that follows (<see cref="ProbeJets.RecordChange"/>).
/// </summary>
public static class ProbeCommands
{
    public static ProbeState Execute(ProbeDesign design, ProbeState state, Telecommand command, ComponentContext context)
    {
        var probe = design.Probe;
        var action = command.Command;
        double Power() => action.Arguments.Single(a => a.Name == "power").ValueSi!.Value;
        string Load() => action.Arguments.Single(a => a.Name == "load").Word!;
        var next = (action.Target.Name, action.Command) switch
        {
            (MissionCatalogue.Head, "set_power") => state with { HeadSetpointW = Math.Min(Power(), probe.MaxHeadPowerW) },
            (MissionCatalogue.Wall, "set_power") => state with { WallSetpointW = Math.Min(Power(), probe.MaxWallPowerW) },
            ("probe", "steer") => state with { SteeringW = Math.Clamp(action.Arguments.Single(a => a.Name == "power_difference").ValueSi!.Value, -probe.MaxHeadPowerW / 2, probe.MaxHeadPowerW / 2) },
            ("probe", "pause_descent") => state with { Paused = true },
            ("probe", "resume_descent") => state with { Paused = false },
            ("probe", "enter_safe_mode") => state with { Paused = true, WallSetpointW = probe.MaxWallPowerW },
            (MissionCatalogue.Bus, "shed_load") when state.Bus is { } bus => state with { Bus = bus with { SwitchedOff = bus.SwitchedOff.Add(Load()) } },
            (MissionCatalogue.Bus, "restore_load") when state.Bus is { } bus => state with { Bus = bus with { SwitchedOff = bus.SwitchedOff.Remove(Load()) } },
            ("probe", "drop_relay") => LetRelayGo(design, state, command, context),
            (MissionCatalogue.Jets, "set_power") when probe.Jets is { } jets => state with { JetSetpointW = Math.Min(Power(), jets.MaxHeatW), MeltFreeRefusedAtWallW = null },
            (MissionCatalogue.Jets, "set_hole_radius") when probe.Jets is { } jets => state with
            {
                JetHoleRadiusM = Math.Clamp(action.Arguments.Single(a => a.Name == "radius").ValueSi!.Value, jets.MinimumHoleRadiusM, Scenarios.Model.ProbeJetsModel.MaxHoleRadiusM),
                MeltFreeRefusedAtWallW = null,
            },
            _ => throw new InvalidOperationException($"The probe has no command {action}."),
        };
        context.Record(CommandRecords.Executed, Severity.Notice,
            RecordField.Of("command", action.ToString()),
            RecordField.Of("origin", command.Origin),
            RecordField.Of("placement", command.Placement),
            RecordField.Of("issued_t_s", command.IssuedAt.SecondsSinceEpoch),
            RecordField.Of("latency_s", (context.Now - command.IssuedAt).TotalSeconds),
            RecordField.Of("head_setpoint_w", next.HeadSetpointW),
            RecordField.Of("wall_setpoint_w", next.WallSetpointW),
            RecordField.Of("paused", next.Paused));
        return next;
    }

    /// <summary>A relay leaves the probe at its head depth; the link takes it from there.</summary>
    private static ProbeState LetRelayGo(ProbeDesign design, ProbeState state, Telecommand command, ComponentContext context)
    {
        context.Schedule(design.Ids.Tether, SimDuration.Zero, new DropRelay(state.DepthM, command.Origin), MissionPriority.Command);
        return state;
    }
}
