namespace DescentOps.Physics.Shell;

/// <summary>
/// A conductive ice shell for scenarios: surface temperature, thickness, the body's gravity, salty layers and debris
/// bands. The base sits at the (saline) pressure-melting point of the pressure the shell itself exerts there; the
/// temperature profile is the k = a/T flat lid between the two (<see cref="PlaneConductiveLid"/>). Base temperature
/// and pressure depend on each other, so they are iterated to 1e-6 K (it converges in two or three passes).
/// </summary>
/// <remarks>
/// MODEL: conductive (optionally over a convecting layer, <see cref="ConvectiveLayer"/>), no internal (tidal) heating; a salty layer changes the melting
/// point, not the conductivity; debris changes nothing thermal here, it is carried for the probe's debris load.
/// </remarks>
public sealed class IceShell
{
    private const string Model = "the ice shell";
    private readonly double[] _pressureProfilePa;
    private readonly IceLayer[] _layers;
    private readonly DebrisBand[] _debrisBands;

    public IceShell(
        double surfaceTemperatureK,
        double thicknessM,
        double gravityMPerS2,
        double surfacePressurePa = 0.0,
        IReadOnlyList<IceLayer>? layers = null,
        IReadOnlyList<DebrisBand>? debrisBands = null,
        double conductivityCoefficientWPerM = Ice.IceConductivity.ReciprocalCoefficientWPerM,
        int integrationSteps = HydrostaticPressure.DefaultSteps,
        double fracturedToDepthM = 0.0,
        ConvectiveLayer? convection = null)
    {
        ThicknessM = ValidRange.RequirePositive(thicknessM, nameof(thicknessM), "m", Model);
        GravityMPerS2 = ValidRange.RequirePositive(gravityMPerS2, nameof(gravityMPerS2), "m/s²", Model);
        SurfacePressurePa = surfacePressurePa;
        FracturedToDepthM = ValidRange.Require(fracturedToDepthM, 0.0, thicknessM, nameof(fracturedToDepthM), "m", Model);
        _layers = CheckIntervals(layers ?? [], l => (l.TopDepthM, l.BottomDepthM), nameof(layers));
        foreach (var l in _layers) ValidRange.Require(l.SalinityGPerKg, 0.0, 40.0, nameof(IceLayer.SalinityGPerKg), "g/kg", Model);
        _debrisBands = CheckIntervals(debrisBands ?? [], b => (b.TopDepthM, b.BottomDepthM), nameof(debrisBands));
        foreach (var b in _debrisBands) ValidRange.Require(b.DebrisVolumeFraction, 0.0, 0.99, nameof(DebrisBand.DebrisVolumeFraction), "", Model);

        var baseSalinity = SalinityGPerKg(thicknessM);
        var meanDensityGuess = 920.0;
        var baseK = SalineIce.MeltingTemperatureK(baseSalinity, HydrostaticPressure.ConstantDensityPa(meanDensityGuess, thicknessM, gravityMPerS2, surfacePressurePa));
        Convection = convection is null ? null : CheckConvection(convection, surfaceTemperatureK, thicknessM);
        double[] profile;
        var iterations = 0;
        while (true)
        {
            var temperatures = new ShellProfile(surfaceTemperatureK, baseK, thicknessM, conductivityCoefficientWPerM, Convection);
            profile = HydrostaticPressure.Profile(temperatures.TemperatureK, thicknessM, gravityMPerS2, surfacePressurePa, integrationSteps);
            var next = SalineIce.MeltingTemperatureK(baseSalinity, profile[^1]);
            var change = Math.Abs(next - baseK);
            baseK = next;
            if (change < 1e-6 || ++iterations >= 20) break;
        }

        if (Convection is { } layer && layer.TemperatureK >= baseK)
        {
            throw new ArgumentOutOfRangeException(nameof(convection), layer.TemperatureK, FormattableString.Invariant($"The convecting layer's temperature {layer.TemperatureK:R} K is outside the valid range (surface, {baseK:R}) K of {Model}: it must stay below the base's melting point."));
        }

        Profile = new ShellProfile(surfaceTemperatureK, baseK, thicknessM, conductivityCoefficientWPerM, Convection);
        _pressureProfilePa = profile;
    }

    private static ConvectiveLayer CheckConvection(ConvectiveLayer layer, double surfaceTemperatureK, double thicknessM)
    {
        ValidRange.Require(layer.TopDepthM, 0.0, thicknessM, nameof(ConvectiveLayer.TopDepthM), "m", Model);
        ValidRange.Require(layer.BasalBoundaryM, 0.0, thicknessM - layer.TopDepthM, nameof(ConvectiveLayer.BasalBoundaryM), "m", Model);
        ValidRange.Require(layer.TemperatureK, surfaceTemperatureK, Ice.TriplePoint.TemperatureK, nameof(ConvectiveLayer.TemperatureK), "K", Model);
        if (layer.TopDepthM <= 0) throw new ArgumentOutOfRangeException(nameof(layer), layer.TopDepthM, $"A convecting layer needs a conductive lid above it: its top depth must be positive in {Model}.");
        return layer;
    }

    public double ThicknessM { get; }

    public double GravityMPerS2 { get; }

    public double SurfacePressurePa { get; }

    /// <summary>Bottom of the open-fractured zone below the surface (0: none); it matters to the liquid-onset depth.</summary>
    public double FracturedToDepthM { get; }

    /// <summary>The convecting layer under the lid, if the shell has one.</summary>
    public ConvectiveLayer? Convection { get; }

    /// <summary>The temperature profile: the conductive lid, and the convecting layer under it if there is one.</summary>
    public ShellProfile Profile { get; }

    public double SurfaceTemperatureK => Profile.SurfaceTemperatureK;

    /// <summary>Pressure-melting temperature at the base, with the base layer's salt.</summary>
    public double BaseTemperatureK => Profile.BaseTemperatureK;

    public double BasePressurePa => _pressureProfilePa[^1];

    /// <summary>Heat flux conducted up through the lid to the surface.</summary>
    public double HeatFluxWPerM2 => Profile.Lid.HeatFluxWPerM2;

    public IReadOnlyList<IceLayer> Layers => _layers;

    public IReadOnlyList<DebrisBand> DebrisBands => _debrisBands;

    public double TemperatureK(double depthM) => Profile.TemperatureK(depthM);

    /// <summary>Hydrostatic pressure, linear between the integration nodes.</summary>
    public double PressurePa(double depthM)
    {
        ValidRange.Require(depthM, 0.0, ThicknessM, nameof(depthM), "m", Model);
        var x = depthM / ThicknessM * (_pressureProfilePa.Length - 1);
        var i = Math.Min((int)x, _pressureProfilePa.Length - 2);
        var f = x - i;
        return (_pressureProfilePa[i] * (1 - f)) + (_pressureProfilePa[i + 1] * f);
    }

    /// <summary>Salinity of the layer at a depth; ice outside every layer is pure.</summary>
    public double SalinityGPerKg(double depthM)
    {
        ValidRange.Require(depthM, 0.0, ThicknessM, nameof(depthM), "m", Model);
        foreach (var l in _layers)
        {
            if (depthM >= l.TopDepthM && depthM <= l.BottomDepthM) return l.SalinityGPerKg;
        }

        return 0.0;
    }

    /// <summary>Melting temperature of the ice at a depth (saline, pressure-dependent). Needs liquid to be possible: p ≥ p_t.</summary>
    public double MeltingTemperatureK(double depthM) => SalineIce.MeltingTemperatureK(SalinityGPerKg(depthM), PressurePa(depthM));

    public double DebrisVolumeFraction(double depthM)
    {
        ValidRange.Require(depthM, 0.0, ThicknessM, nameof(depthM), "m", Model);
        foreach (var b in _debrisBands)
        {
            if (depthM >= b.TopDepthM && depthM <= b.BottomDepthM) return b.DebrisVolumeFraction;
        }

        return 0.0;
    }

    /// <summary>
    /// Thickness of the debris layer a probe collects on its head between two depths, h_d = ∫φ_d dz/(1 − n_p)
    /// (RULE: all released debris settles in the melt pocket as a deposit of porosity n_p, default 0.4).
    /// </summary>
    public double AccumulatedDebrisThicknessM(double fromDepthM, double toDepthM, double depositPorosity = 0.4)
    {
        ValidRange.Require(fromDepthM, 0.0, ThicknessM, nameof(fromDepthM), "m", Model);
        ValidRange.Require(toDepthM, fromDepthM, ThicknessM, nameof(toDepthM), "m", Model);
        ValidRange.Require(depositPorosity, 0.0, 0.95, nameof(depositPorosity), "", Model);
        var volume = 0.0;
        foreach (var b in _debrisBands)
        {
            var overlap = Math.Min(toDepthM, b.BottomDepthM) - Math.Max(fromDepthM, b.TopDepthM);
            if (overlap > 0) volume += overlap * b.DebrisVolumeFraction;
        }

        return volume / (1.0 - depositPorosity);
    }

    private T[] CheckIntervals<T>(IReadOnlyList<T> items, Func<T, (double Top, double Bottom)> bounds, string name)
    {
        var sorted = items.OrderBy(i => bounds(i).Top).ToArray();
        var previousBottom = double.NegativeInfinity;
        foreach (var item in sorted)
        {
            var (top, bottom) = bounds(item);
            ValidRange.Require(top, 0.0, ThicknessM, name + ".TopDepthM", "m", Model);
            ValidRange.Require(bottom, top, ThicknessM, name + ".BottomDepthM", "m", Model);
            if (top < previousBottom) throw new ArgumentException($"The intervals in {name} overlap.", name);
            previousBottom = bottom;
        }

        return sorted;
    }
}
