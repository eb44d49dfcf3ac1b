using System.Diagnostics;
using DescentOps.Mission.Probe;
using DescentOps.Primitives.Time;
using DescentOps.Scenarios.Model;

namespace DescentOps.Mission.Onboard;

/// <summary>
/// What a sensor would report at any instant before the probe's next event, from the committed state moved on by the
/// probe's own motion law (<see cref="ProbeMotion"/>). The state is only looked at, never committed: sampling does not
/// change what the probe does. A bias or a stuck sensor is applied here; a noisy one draws at the sample itself.
/// </summary>
public static class OnboardReadings
{
    /// <summary>The true value of a numeric point at <paramref name="time"/>.</summary>
    public static double TrueAt(ProbeDesign design, ProbeState state, string point, SimTime time)
    {
        var moved = time == state.LastUpdate ? state : ProbeMotion.Advance(design, state, time);
        foreach (var (name, value) in ProbeSensors.TrueReadings(design, moved))
        {
            if (name == point) return value;
        }

        throw new ArgumentException($"'{point}' is not a numeric point of the probe", nameof(point));
    }

    /// <summary>The fault deciding what a point reports (the last one on it), or null.</summary>
    public static ActiveSensorFault? FaultOn(ProbeState state, string point)
    {
        ActiveSensorFault? last = null;
        foreach (var fault in state.SensorFaults)
        {
            if (fault.Effect.Point == point) last = fault;
        }

        return last;
    }

    /// <summary>The reported value without noise; null when the sensor has dropped out.</summary>
    public static double? Reported(ActiveSensorFault? fault, double truth) => fault?.Effect switch
    {
        null => truth,
        FaultEffect.SensorStuck => fault.StuckAtSi!.Value,
        FaultEffect.SensorBias bias => truth + bias.OffsetSi,
        FaultEffect.SensorDropout => null,
        FaultEffect.SensorNoise => truth, // the noise is drawn by the caller (IsNoisy)
        _ => throw new UnreachableException($"Sensor fault {fault.Effect.GetType().Name} has no reading."),
    };

    public static bool IsNoisy(ActiveSensorFault? fault) => fault?.Effect is FaultEffect.SensorNoise;
}
