namespace DescentOps.Scenarios.Model;

/// <summary>The melt probe as built: size, mass, heaters, telemetry cadence, the water gap that refreezes when it stops, and its hot-water jets if it has them.</summary>
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
    double MaxTiltRad)
{
    /// <summary>The hot-water jets, or null for a probe that descends by its heated head alone.</summary>
    public ProbeJetsModel? Jets { get; init; }
}
