using DescentOps.Physics.Descent;
using DescentOps.Physics.Shell;
using DescentOps.Scenarios.Model;

namespace DescentOps.Mission.Probe;

/// <summary>
/// Builds the shell and descent model a scenario's probe runs on. The simulator's probe and the
/// <c>physics crossing</c> command both call this, so an engineering answer comes from the very model the run uses.
/// </summary>
public static class ProbeDescentFactory
{
    /// <summary>Thickness of the basal layer that carries the ocean's salt.</summary>
    public const double BasalLayerThicknessM = 1.0;

    /// <param name="scenario">The scenario whose shell is modelled.</param>
    /// <param name="conductivityCoefficientWPerM">The a of k = a/T for the lid (a sensitivity knob; the run uses the default).</param>
    public static IceShell Shell(Scenario scenario, double conductivityCoefficientWPerM = Physics.Ice.IceConductivity.ReciprocalCoefficientWPerM)
    {
        ArgumentNullException.ThrowIfNull(scenario);
        return new IceShell(
            scenario.Shell.SurfaceTemperatureK,
            scenario.Shell.ThicknessM,
            scenario.Body.GravityMPerS2,
            scenario.Body.SurfacePressurePa,
            Layers(scenario.Shell),
            [.. scenario.Shell.DebrisBands.Select(b => new DebrisBand(b.TopM, b.BottomM, b.VolumeFraction))],
            conductivityCoefficientWPerM,
            fracturedToDepthM: scenario.Shell.FracturedToM,
            convection: scenario.Shell.Convection is { } c ? new ConvectiveLayer(c.TopM, c.TemperatureK, c.BasalBoundaryM) : null);
    }

    /// <summary>The scenario's salty layers, and the basal layer in whatever parts of the bottom metre they leave free.</summary>
    private static IReadOnlyList<IceLayer> Layers(ShellModel shell)
    {
        var layers = shell.Layers.Select(l => new IceLayer(l.TopM, l.BottomM, l.SalinityKgPerKg * 1000.0)).ToList();
        var basal = BasalLayer(shell);
        var from = basal.TopDepthM;
        foreach (var layer in layers.Where(l => l.BottomDepthM > basal.TopDepthM).OrderBy(l => l.TopDepthM).ToList())
        {
            if (layer.TopDepthM > from) layers.Add(basal with { TopDepthM = from, BottomDepthM = layer.TopDepthM });
            from = Math.Max(from, layer.BottomDepthM);
        }

        if (from < basal.BottomDepthM) layers.Add(basal with { TopDepthM = from });
        return layers;
    }

    /// <param name="scenario">The scenario whose probe and shell are modelled.</param>
    /// <param name="nodeSpacingM">Depth spacing of cached steady solutions (a sensitivity knob; the run uses the default).</param>
    /// <param name="sealDiameters">Hole diameters to seal before liquid can form (a sensitivity knob; the run uses the default).</param>
    /// <param name="conductivityCoefficientWPerM">The a of k = a/T for the lid.</param>
    public static ProbeDescentModel Model(
        Scenario scenario,
        double nodeSpacingM = ProbeDescentModel.DefaultNodeSpacingM,
        double sealDiameters = Physics.Vacuum.LiquidOnset.DefaultSealDiameters,
        double conductivityCoefficientWPerM = Physics.Ice.IceConductivity.ReciprocalCoefficientWPerM)
    {
        ArgumentNullException.ThrowIfNull(scenario);
        return new ProbeDescentModel(Shell(scenario, conductivityCoefficientWPerM), new ProbeGeometry(scenario.Probe.RadiusM, scenario.Probe.LengthM, scenario.Probe.MassKg), nodeSpacingM, sealDiameters, scenario.Probe.FreezeGapM);
    }

    /// <summary>
    /// The ice at the base freezes from the ocean, so its melting point is the ocean's freezing point: a one-metre
    /// basal layer carries the ocean's salinity (MODEL; the shell above is fresh unless a scenario says otherwise).
    /// </summary>
    private static IceLayer BasalLayer(ShellModel shell) =>
        new(Math.Max(0, shell.ThicknessM - BasalLayerThicknessM), shell.ThicknessM, shell.OceanSalinityKgPerKg * 1000.0);
}
