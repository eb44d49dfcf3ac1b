using System.Diagnostics;
using DescentOps.Engine.Components;
using DescentOps.Records;
using DescentOps.Engine.Randomness;
using DescentOps.Scenarios.Model;
using DescentOps.Records.Kinds;

namespace DescentOps.Mission.Probe;

/// <summary>
/// The probe's sensors: the true readings in the catalogue's point names and SI units, and what the sensors report
/// when faults are in force (stuck, biased, noisy, dropped out). Sensor faults change what is reported, not what is.
/// </summary>
public static class ProbeSensors
{
    /// <summary>What the probe's sensors would read if none were faulty.</summary>
    public static IReadOnlyList<(string Point, double Value)> TrueReadings(ProbeDesign design, ProbeState state) =>
    [
        ("probe.depth", state.DepthM),
        ("probe.velocity", state.VelocityMPerS),
        ("probe.ice_temperature", design.Descent.Shell.TemperatureK(state.DepthM)),
        ("probe.head_power", ProbeHeaters.HeadPowerW(design, state)),
        ("probe.wall_power", ProbeHeaters.WallPowerW(design, state)),
        ("probe.energy_used", state.EnergyUsedJ),
        ("probe.tilt", state.TiltRad),
        ("probe.battery_soc", state.Bus?.StateOfCharge ?? 0.0),
        ("probe.bus_power_available", state.Bus?.Allocation.AvailablePowerW ?? ProbeHeaters.BusPowerW(design, state)),
        ("probe.buffer_fill", state.BufferFill),
        ("probe.jet_power", ProbeJets.HeatW(design, state)),
        ("probe.hole_radius", ProbeJets.HoleRadiusM(design, state)),
    ];

    /// <summary>True state that no sensor reports: only a fault's trigger reads it (the catalogue marks it so).</summary>
    public static IReadOnlyList<(string Point, double Value)> TrueStateOnly(ProbeState state) =>
    [
        ("probe.lateral_drift", state.LateralDriftM),
    ];

    /// <summary>
    /// The readings as reported: the last fault on a point decides. A noisy sensor draws from <paramref name="random"/>
    /// only while its fault lasts, so runs without it keep their draws.
    /// </summary>
    public static List<(string Point, double Value)> Reported(IReadOnlyList<(string Point, double Value)> truth, IReadOnlyList<ActiveSensorFault> faults, RandomStream random)
    {
        var reported = new List<(string Point, double Value)>(truth.Count);
        foreach (var (point, value) in truth)
        {
            var fault = faults.LastOrDefault(f => f.Effect.Point == point);
            switch (fault?.Effect)
            {
                case null:
                    reported.Add((point, value));
                    break;
                case FaultEffect.SensorStuck:
                    reported.Add((point, fault.StuckAtSi!.Value));
                    break;
                case FaultEffect.SensorBias bias:
                    reported.Add((point, value + bias.OffsetSi));
                    break;
                case FaultEffect.SensorNoise noise:
                    reported.Add((point, value + random.NextNormal(0.0, noise.SigmaSi)));
                    break;
                case FaultEffect.SensorDropout:
                    break;
                default:
                    throw new UnreachableException($"Sensor fault {fault.Effect.GetType().Name} has no reading.");
            }
        }

        return reported;
    }

    /// <summary>A sensor fault begins: a stuck sensor repeats its given value, or the true value at this instant.</summary>
    public static ProbeState StartFault(ProbeDesign design, ProbeState state, string name, FaultEffect.SensorFault fault, ComponentContext context)
    {
        var truth = TrueReadings(design, state).First(r => r.Point == fault.Point).Value;
        var stuckAt = fault is FaultEffect.SensorStuck stuck ? stuck.ValueSi ?? truth : (double?)null;
        context.Record(ProbeRecords.SensorFault, Severity.Warning,
            RecordField.Of("fault", name),
            RecordField.Of("point", fault.Point),
            RecordField.Of("mode", fault.Kind.ToString()),
            RecordField.Of("true_value", truth));
        return state with { SensorFaults = state.SensorFaults.Add(new ActiveSensorFault(name, fault, stuckAt)) };
    }

    public static ProbeState EndFault(ProbeState state, string name, FaultEffect.SensorFault fault, ComponentContext context)
    {
        context.Record(ProbeRecords.SensorRestored, Severity.Notice, RecordField.Of("fault", name), RecordField.Of("point", fault.Point));
        return state with { SensorFaults = state.SensorFaults.RemoveAll(f => f.Name == name) };
    }
}
