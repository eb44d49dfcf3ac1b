namespace DescentOps.Physics.Ocean;

/// <summary>EOS-80 result: in-situ density, density at zero sea pressure and the secant bulk modulus K(S, t, p).</summary>
public sealed record SeawaterDensityState(double DensityKgPerM3, double SurfaceDensityKgPerM3, double SecantBulkModulusPa);
