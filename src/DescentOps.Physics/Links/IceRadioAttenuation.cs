namespace DescentOps.Physics.Links;

/// <summary>
/// One-way radio attenuation in ice, N_a = 10·log10(e)·σ/(ε0·c·√ε′) (MacGregor et al. 2007), in the low-loss limit
/// that holds far above the ice's Debye relaxation and below about 1 GHz.
/// </summary>
public static class IceRadioAttenuation
{
    /// <summary>Default layers for a path integral; the integrand is steep near a warm base, and 1e4 layers resolve it.</summary>
    public const int DefaultLayers = 10_000;

    private const double VacuumPermittivityFPerM = 8.8541878128e-12;
    private const double SpeedOfLightMPerS = PhysicalConstants.SpeedOfLightMPerS;
    private const string Model = "the ice radio attenuation";

    /// <summary>dB/m per S/m of conductivity for a relative permittivity.</summary>
    public static double DbPerMPerSPerM(double relativePermittivity)
    {
        ValidRange.Require(relativePermittivity, 1.0, 100.0, nameof(relativePermittivity), "(relative permittivity)", Model);
        return 10.0 * Math.Log10(Math.E) / (VacuumPermittivityFPerM * SpeedOfLightMPerS * Math.Sqrt(relativePermittivity));
    }

    /// <summary>Attenuation rate at one temperature and chemistry, dB/m.</summary>
    public static double DbPerM(double temperatureK, IceConductivityParameters parameters, IceImpurities impurities) =>
        IceElectricalConductivity.SPerM(temperatureK, parameters, impurities) * DbPerMPerSPerM(parameters.RelativePermittivity);

    /// <summary>
    /// One-way loss ∫N_a dz between two depths of a shell with a temperature profile and uniform chemistry (composite
    /// Simpson rule). Radar two-way loss is twice this.
    /// </summary>
    public static double OneWayPathLossDb(Func<double, double> temperatureAtDepthK, double topDepthM, double bottomDepthM, IceConductivityParameters parameters, IceImpurities impurities, int layers = DefaultLayers)
    {
        ArgumentNullException.ThrowIfNull(temperatureAtDepthK);
        ValidRange.RequireNonNegative(topDepthM, nameof(topDepthM), "m", Model);
        ValidRange.Require(bottomDepthM, topDepthM, double.MaxValue, nameof(bottomDepthM), "m", Model);
        if (layers < 2 || layers % 2 != 0) throw new ArgumentOutOfRangeException(nameof(layers), layers, "layers must be an even number of at least 2 (Simpson's rule).");
        var h = (bottomDepthM - topDepthM) / layers;
        double N(double z) => DbPerM(temperatureAtDepthK(z), parameters, impurities);
        var sum = N(topDepthM) + N(bottomDepthM);
        for (var i = 1; i < layers; i++) sum += (i % 2 == 1 ? 4.0 : 2.0) * N(topDepthM + (i * h));
        return sum * h / 3.0;
    }
}
