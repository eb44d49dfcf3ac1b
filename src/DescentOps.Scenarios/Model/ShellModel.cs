namespace DescentOps.Scenarios.Model;

/// <summary>
/// The ice shell between the surface and the ocean. The temperature profile is conductive for a
/// conductivity that goes as 1/T, which gives T(z) = Ts (Tb/Ts)^(z/H) with Tb the melting point at the base.
/// </summary>
public sealed record ShellModel(double ThicknessM, double SurfaceTemperatureK, double OceanSalinityKgPerKg);
