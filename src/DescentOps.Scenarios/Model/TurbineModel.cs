namespace DescentOps.Scenarios.Model;

/// <summary>A current turbine on the probe that turns once the probe hangs in the ocean below the ice.</summary>
public sealed record TurbineModel(
    double RotorDiameterM,
    double PowerCoefficient,
    double DrivetrainEfficiency,
    double CutInSpeedMPerS,
    double RatedSpeedMPerS,
    double CurrentSpeedMPerS,
    double WaterDensityKgPerM3);
