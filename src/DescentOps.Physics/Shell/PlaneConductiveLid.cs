namespace DescentOps.Physics.Shell;

/// <summary>
/// Steady conduction through a flat ice lid with k = a/T and no internal heating. With the Kirchhoff potential
/// a ln T linear in depth the profile is geometric, T(z) = T_s (T_b/T_s)^(z/D), and the flux is (a/D) ln(T_b/T_s).
/// Suits shells much thinner than the body's radius.
/// </summary>
public sealed record PlaneConductiveLid
{
    public PlaneConductiveLid(double surfaceTemperatureK, double baseTemperatureK, double thicknessM, double conductivityCoefficientWPerM = Ice.IceConductivity.ReciprocalCoefficientWPerM)
    {
        SurfaceTemperatureK = ValidRange.Require(surfaceTemperatureK, 1.0, Ice.TriplePoint.TemperatureK, nameof(surfaceTemperatureK), "K", "the conductive lid");
        BaseTemperatureK = ValidRange.Require(baseTemperatureK, surfaceTemperatureK, Ice.TriplePoint.TemperatureK, nameof(baseTemperatureK), "K", "the conductive lid");
        ThicknessM = ValidRange.RequirePositive(thicknessM, nameof(thicknessM), "m", "the conductive lid");
        ConductivityCoefficientWPerM = ValidRange.RequirePositive(conductivityCoefficientWPerM, nameof(conductivityCoefficientWPerM), "W/m", "the conductive lid");
    }

    public double SurfaceTemperatureK { get; }

    public double BaseTemperatureK { get; }

    public double ThicknessM { get; }

    public double ConductivityCoefficientWPerM { get; }

    /// <summary>Upward conductive heat flux, the same at every depth.</summary>
    public double HeatFluxWPerM2 => ConductivityCoefficientWPerM / ThicknessM * Math.Log(BaseTemperatureK / SurfaceTemperatureK);

    public double TemperatureK(double depthM)
    {
        ValidRange.Require(depthM, 0.0, ThicknessM, nameof(depthM), "m", "the conductive lid");
        return SurfaceTemperatureK * Math.Pow(BaseTemperatureK / SurfaceTemperatureK, depthM / ThicknessM);
    }
}
