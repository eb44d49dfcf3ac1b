namespace DescentOps.Physics.Vacuum;

/// <summary>A head sublimating into vacuum: its surface temperature, mass flux, descent speed and energy per kilogram removed.</summary>
public sealed record VacuumHeadSolution(double SurfaceTemperatureK, double MassFluxKgPerM2S, double VelocityMPerS, double EnergyPerKgJ);
