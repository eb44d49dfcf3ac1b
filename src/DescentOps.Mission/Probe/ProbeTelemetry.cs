using DescentOps.Engine.Components;
using DescentOps.Records;
using DescentOps.Mission.Messages;
using DescentOps.Primitives.Time;
using DescentOps.Records.Kinds;

namespace DescentOps.Mission.Probe;

/// <summary>
/// One telemetry frame: the true values go into the log (<c>probe.telemetry</c>), the reported ones go up the tether
/// and to the on-board autonomy, and the true ones to the fault injector when a fault watches them.
/// </summary>
public static class ProbeTelemetry
{
    public static ProbeState SendFrame(ProbeDesign design, ProbeState state, ComponentContext context)
    {
        var truth = ProbeSensors.TrueReadings(design, state);
        var reported = ProbeSensors.Reported(truth, state.SensorFaults, context.Random);
        var frame = new TelemetryFrame(state.FramesSent + 1, context.Now, state.Regime.ToString(), reported, state.DepthM, state.VehiclesActive, [("probe.link_path", state.LinkPath), .. ProbeLoadStates.Readings(design, state)]);
        context.Record(ProbeRecords.Telemetry, Severity.Debug, [.. Fields(design, state, frame, truth)]);
        context.Schedule(design.Ids.Tether, SimDuration.Zero, frame, MissionPriority.Telemetry);
        // With on-board sampling the rules read the sensors themselves (Onboard.OnboardSampler), not the frames.
        if (design.Onboard is null) context.Schedule(design.Ids.Autonomy, SimDuration.Zero, frame, MissionPriority.Telemetry);
        if (design.WatchedByFaults)
        {
            // A fault's trigger also reads true state no sensor reports (ProbeSensors.TrueStateOnly).
            context.Schedule(design.Ids.FaultInjector, SimDuration.Zero, new TrueStateFrame(frame with { Readings = [.. truth, .. ProbeSensors.TrueStateOnly(state)] }), MissionPriority.Telemetry);
        }

        return state with { FramesSent = frame.Sequence, NextFrameAt = context.Now + design.FrameInterval };
    }

    /// <summary>The true values of a frame as logged; the jets' figures only for a probe with jets, the bus figures only for a probe with a power system.</summary>
    private static IEnumerable<RecordField> Fields(ProbeDesign design, ProbeState state, TelemetryFrame frame, IReadOnlyList<(string Point, double Value)> truth)
    {
        IEnumerable<RecordField> fields =
        [
            RecordField.Of("frame", frame.Sequence),
            RecordField.Of("regime", frame.Regime),
            RecordField.Of("depth_m", state.DepthM),
            RecordField.Of("velocity_m_s", state.VelocityMPerS),
            RecordField.Of("ice_temperature_k", truth.First(r => r.Point == "probe.ice_temperature").Value),
            RecordField.Of("head_power_w", ProbeHeaters.HeadPowerW(design, state)),
            RecordField.Of("wall_power_w", ProbeHeaters.WallPowerW(design, state)),
            RecordField.Of("energy_used_j", state.EnergyUsedJ),
            RecordField.Of("tilt_rad", state.TiltRad),
            RecordField.Of("lateral_drift_m", state.LateralDriftM),
            RecordField.Of("buffer_fill", state.BufferFill),
        ];
        if (design.Probe.Jets is not null)
        {
            fields = fields.Concat(
            [
                RecordField.Of("jet_heat_w", ProbeJets.HeatW(design, state)),
                RecordField.Of("jet_pump_power_w", ProbeJets.PumpPowerW(design, state)),
                RecordField.Of("hole_radius_m", ProbeJets.HoleRadiusM(design, state)),
            ]);
        }

        if (state.Bus is not { } bus) return fields;
        var e = bus.Energy;
        return fields.Concat(
        [
            RecordField.Of("battery_soc", bus.StateOfCharge),
            RecordField.Of("bus_power_available_w", bus.Allocation.AvailablePowerW),
            RecordField.Of("bus_load_w", bus.Allocation.Loads.SuppliedPowerW),
            RecordField.Of("source_power_w", bus.Allocation.SourcePowerW),
            RecordField.Of("harvest_power_w", bus.Allocation.HarvestPowerW),
            RecordField.Of("source_j", e.SourceJ),
            RecordField.Of("harvest_j", e.HarvestJ),
            RecordField.Of("battery_out_j", e.BatteryOutJ),
            RecordField.Of("battery_in_j", e.BatteryInJ),
            RecordField.Of("loads_j", e.LoadsJ),
            RecordField.Of("unserved_j", e.UnservedJ),
            RecordField.Of("curtailed_j", e.CurtailedJ),
            RecordField.Of("battery_loss_j", e.BatteryLossJ),
            RecordField.Of("self_discharge_j", e.SelfDischargeJ),
        ]);
    }
}
