namespace DescentOps.Physics.Shell;

/// <summary>
/// Steady conduction through a spherical ice shell with k = a/T and no internal heating: a ln T is linear in 1/r,
/// so T(r) = T_s (T_b/T_s)^x with x = (1/r − 1/r_s)/(1/r_b − 1/r_s). Needed when the shell is not thin against the radius
/// (small icy moons), where the flat-lid flux is off by several per cent.
/// </summary>
public sealed record SphericalConductiveLid
{
    public SphericalConductiveLid(double surfaceTemperatureK, double baseTemperatureK, double outerRadiusM, double thicknessM, double conductivityCoefficientWPerM = Ice.IceConductivity.ReciprocalCoefficientWPerM)
    {
        SurfaceTemperatureK = ValidRange.Require(surfaceTemperatureK, 1.0, Ice.TriplePoint.TemperatureK, nameof(surfaceTemperatureK), "K", "the spherical conductive lid");
        BaseTemperatureK = ValidRange.Require(baseTemperatureK, surfaceTemperatureK, Ice.TriplePoint.TemperatureK, nameof(baseTemperatureK), "K", "the spherical conductive lid");
        OuterRadiusM = ValidRange.RequirePositive(outerRadiusM, nameof(outerRadiusM), "m", "the spherical conductive lid");
        ThicknessM = ValidRange.Require(thicknessM, double.Epsilon, outerRadiusM * (1 - 1e-12), nameof(thicknessM), "m", "the spherical conductive lid");
        ConductivityCoefficientWPerM = ValidRange.RequirePositive(conductivityCoefficientWPerM, nameof(conductivityCoefficientWPerM), "W/m", "the spherical conductive lid");
    }

    public double SurfaceTemperatureK { get; }

    public double BaseTemperatureK { get; }

    public double OuterRadiusM { get; }

    public double ThicknessM { get; }

    public double ConductivityCoefficientWPerM { get; }

    private double InnerRadiusM => OuterRadiusM - ThicknessM;

    /// <summary>Upward heat flux at the surface.</summary>
    public double SurfaceHeatFluxWPerM2 =>
        ConductivityCoefficientWPerM * Math.Log(BaseTemperatureK / SurfaceTemperatureK)
        / (OuterRadiusM * OuterRadiusM * ((1.0 / InnerRadiusM) - (1.0 / OuterRadiusM)));

    public double TemperatureK(double depthM)
    {
        ValidRange.Require(depthM, 0.0, ThicknessM, nameof(depthM), "m", "the spherical conductive lid");
        var r = OuterRadiusM - depthM;
        var x = ((1.0 / r) - (1.0 / OuterRadiusM)) / ((1.0 / InnerRadiusM) - (1.0 / OuterRadiusM));
        return SurfaceTemperatureK * Math.Pow(BaseTemperatureK / SurfaceTemperatureK, x);
    }
}
