namespace DescentOps.Scenarios.Model;

/// <summary>The melt probe as built: size, heaters, how well the head turns power into melting, telemetry cadence.</summary>
public sealed record ProbeModel(
    string Name,
    double RadiusM,
    double LengthM,
    double MassKg,
    double HeadPowerW,
    double WallPowerW,
    double ElectronicsPowerW,
    double HeadEfficiency,
    double TelemetryIntervalS);
