namespace DescentOps.Physics.Shell;

/// <summary>
/// Temperature with depth in a shell: the k = a/T conductive lid from the surface to its base (the whole shell, or the top
/// of a convecting layer at the layer's temperature), then the convecting layer's isothermal core and its linear basal
/// boundary layer up to the melting point at the base.
/// </summary>
public sealed class ShellProfile
{
    public ShellProfile(double surfaceTemperatureK, double baseTemperatureK, double thicknessM, double conductivityCoefficientWPerM, ConvectiveLayer? convection)
    {
        ThicknessM = thicknessM;
        BaseTemperatureK = baseTemperatureK;
        Convection = convection;
        Lid = convection is { } layer
            ? new PlaneConductiveLid(surfaceTemperatureK, layer.TemperatureK, layer.TopDepthM, conductivityCoefficientWPerM)
            : new PlaneConductiveLid(surfaceTemperatureK, baseTemperatureK, thicknessM, conductivityCoefficientWPerM);
    }

    /// <summary>The conductive lid: the whole shell, or the part above the convecting layer.</summary>
    public PlaneConductiveLid Lid { get; }

    public ConvectiveLayer? Convection { get; }

    public double ThicknessM { get; }

    public double SurfaceTemperatureK => Lid.SurfaceTemperatureK;

    public double BaseTemperatureK { get; }

    public double TemperatureK(double depthM)
    {
        ValidRange.Require(depthM, 0.0, ThicknessM, nameof(depthM), "m", "the shell's temperature profile");
        if (Convection is not { } layer || depthM <= layer.TopDepthM) return Lid.TemperatureK(Math.Min(depthM, Lid.ThicknessM));
        var boundaryTop = ThicknessM - layer.BasalBoundaryM;
        if (depthM <= boundaryTop || layer.BasalBoundaryM <= 0) return layer.TemperatureK;
        return layer.TemperatureK + ((BaseTemperatureK - layer.TemperatureK) * (depthM - boundaryTop) / layer.BasalBoundaryM);
    }
}
