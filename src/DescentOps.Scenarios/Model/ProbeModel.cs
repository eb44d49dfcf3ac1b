namespace DescentOps.Scenarios.Model;

/// <summary>The melt probe as built: size, mass, heaters, telemetry cadence, and the water gap that refreezes when it stops.</summary>
public sealed record ProbeModel(
    string Name,
    double RadiusM,
    double LengthM,
    double MassKg,
    double HeadPowerW,
    double WallPowerW,
    double ElectronicsPowerW,
    double TelemetryIntervalS,
    double FreezeGapM,
    double MaxHeadPowerW,
    double MaxWallPowerW,
    double MaxTiltRad);
