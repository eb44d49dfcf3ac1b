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

    public static IceShell Shell(Scenario scenario)
    {
        ArgumentNullException.ThrowIfNull(scenario);
        return new IceShell(
            scenario.Shell.SurfaceTemperatureK,
            scenario.Shell.ThicknessM,
            scenario.Body.GravityMPerS2,
            scenario.Body.SurfacePressurePa,
            [BasalLayer(scenario.Shell)]);
    }

    public static ProbeDescentModel Model(Scenario scenario)
    {
        ArgumentNullException.ThrowIfNull(scenario);
        return new ProbeDescentModel(Shell(scenario), new ProbeGeometry(scenario.Probe.RadiusM, scenario.Probe.LengthM, scenario.Probe.MassKg));
    }

    /// <summary>
    /// The ice at the base freezes from the ocean, so its melting point is the ocean's freezing point: a one-metre
    /// basal layer carries the ocean's salinity (MODEL; the shell above is fresh unless a scenario says otherwise).
    /// </summary>
    private static IceLayer BasalLayer(ShellModel shell) =>
        new(Math.Max(0, shell.ThicknessM - BasalLayerThicknessM), shell.ThicknessM, shell.OceanSalinityKgPerKg * 1000.0);
}
