using DescentOps.Physics.Descent;
using DescentOps.Physics.Shell;
using DescentOps.Scenarios.Envelope;
using DescentOps.Scenarios.Model;

namespace DescentOps.Mission.Probe;

/// <summary>
/// Builds the shell and descent model a scenario's probe runs on. The simulator's probe and the
/// <c>physics crossing</c> command both call this, so an engineering answer comes from the very model the run uses.
/// </summary>
public static class ProbeDescentFactory
{
    /// <summary>Thickness of the basal layer that carries the ocean's salt.</summary>
    public const double BasalLayerThicknessM = ScenarioShell.BasalLayerThicknessM;

    /// <param name="scenario">The scenario whose shell is modelled.</param>
    /// <param name="conductivityCoefficientWPerM">The a of k = a/T for the lid (a sensitivity knob; the run uses the default).</param>
    public static IceShell Shell(Scenario scenario, double conductivityCoefficientWPerM = Physics.Ice.IceConductivity.ReciprocalCoefficientWPerM) =>
        ScenarioShell.Build(scenario, conductivityCoefficientWPerM);

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
}
