using DescentOps.Primitives.Time;

namespace DescentOps.Mission.Messages;

/// <summary>A housekeeping frame from the probe, as it travels up the tether and home.</summary>
public sealed record TelemetryFrame(
    long Sequence,
    SimTime SampledAt,
    string Regime,
    double DepthM,
    double VelocityMPerS,
    double IceTemperatureK,
    double HeadPowerW,
    double WallPowerW,
    double EnergyUsedJ,
    int VehiclesActive);
