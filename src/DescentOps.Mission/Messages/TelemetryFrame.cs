using DescentOps.Primitives.Time;

namespace DescentOps.Mission.Messages;

/// <summary>
/// A housekeeping frame from the probe, as it travels up the tether and home. <see cref="Readings"/> are what the
/// sensors report (a faulty sensor lies, a dropped one is missing); <see cref="PaidOutM"/> is the tether's own
/// measure of fibre paid out, which is what the spool physically did.
/// </summary>
public sealed record TelemetryFrame(
    long Sequence,
    SimTime SampledAt,
    string Regime,
    IReadOnlyList<(string Point, double Value)> Readings,
    double PaidOutM,
    int VehiclesActive,
    IReadOnlyList<(string Point, string State)>? States = null)
{
    /// <summary>Discrete readings besides the regime (the link path), in the order the rules take them.</summary>
    public IReadOnlyList<(string Point, string State)> DiscreteReadings => States ?? [];

    public double? Reading(string point)
    {
        foreach (var (name, value) in Readings)
        {
            if (name == point) return value;
        }

        return null;
    }
}
