using DescentOps.Physics.Shell;
using DescentOps.Scenarios.Model;

namespace DescentOps.Scenarios.Envelope;

/// <summary>
/// The ice shell a scenario describes, built once for the probe's run, the loader's range checks and the
/// <c>physics crossing</c> command alike, so all three see the same shell.
/// </summary>
public static class ScenarioShell
{
    /// <summary>Thickness of the basal layer that carries the ocean's salt.</summary>
    public const double BasalLayerThicknessM = 1.0;

    /// <param name="scenario">The scenario whose shell is modelled.</param>
    /// <param name="conductivityCoefficientWPerM">The a of k = a/T for the lid (a sensitivity knob; the run uses the default).</param>
    public static IceShell Build(Scenario scenario, double conductivityCoefficientWPerM = Physics.Ice.IceConductivity.ReciprocalCoefficientWPerM)
    {
        ArgumentNullException.ThrowIfNull(scenario);
        // The shell is immutable and costs a hydrostatic integration: the loader's checks, the probe and the tether share
        // one per scenario object (a scenario is an immutable record, so the same object always means the same shell).
        return conductivityCoefficientWPerM == Physics.Ice.IceConductivity.ReciprocalCoefficientWPerM
            ? Cache.GetValue(scenario, s => Create(s, conductivityCoefficientWPerM))
            : Create(scenario, conductivityCoefficientWPerM);
    }

    private static readonly System.Runtime.CompilerServices.ConditionalWeakTable<Scenario, IceShell> Cache = [];

    private static IceShell Create(Scenario scenario, double conductivityCoefficientWPerM)
    {
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
    private static List<IceLayer> Layers(ShellModel shell)
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

    /// <summary>
    /// The ice at the base freezes from the ocean, so its melting point is the ocean's freezing point: a one-metre
    /// basal layer carries the ocean's salinity (MODEL; the shell above is fresh unless a scenario says otherwise).
    /// </summary>
    private static IceLayer BasalLayer(ShellModel shell) =>
        new(Math.Max(0, shell.ThicknessM - BasalLayerThicknessM), shell.ThicknessM, shell.OceanSalinityKgPerKg * 1000.0);
}
