using DescentOps.Scenarios.Model;

namespace DescentOps.Scenarios.Loading;

/// <summary>The probe's hot-water jets section and the rules that tie it to the probe and to the faults.</summary>
internal static class JetsReader
{
    /// <summary>The jets section; the efficiency defaults to the rule of thumb the jet model carries (<see cref="Physics.Descent.HotWaterJet.DefaultEfficiency"/>).</summary>
    internal static ProbeJetsModel Read(BoundSection jets) => new(
        jets.Quantity("heat"),
        jets.Quantity("pump_power"),
        jets.Quantity("minimum_hole_radius"),
        jets.OptionalQuantity("hole_radius") ?? jets.Quantity("minimum_hole_radius"),
        jets.OptionalNumber("efficiency") ?? Physics.Descent.HotWaterJet.DefaultEfficiency,
        jets.OptionalQuantity("initial_power") ?? 0.0);

    /// <summary>The jets cut a hole wider than the probe, no narrower than their minimum, with no more heat than they have; a clogged nozzle needs jets.</summary>
    internal static void Check(Scenario scenario, BoundSection root, List<ScenarioError> errors)
    {
        var faults = root.List("faults");
        for (var i = 0; i < faults.Count; i++)
        {
            if (FaultReader.KindOf(faults[i]) == FaultKind.CloggedNozzle && scenario.Probe.Jets is null)
            {
                errors.Add(new ScenarioError(faults[i].LocationOf("kind"), $"faults[{i}].kind", "a clogged_nozzle needs a probe with jets (probe.jets)"));
            }
        }

        if (scenario.Probe.Jets is not { } jets || root.Section("probe").OptionalSection("jets") is not { } section) return;
        if (jets.MinimumHoleRadiusM <= scenario.Probe.RadiusM)
        {
            errors.Add(new ScenarioError(section.LocationOf("minimum_hole_radius"), "probe.jets.minimum_hole_radius", $"the jets' hole must be wider than the probe's radius of {scenario.Probe.RadiusM.ToString("G6", System.Globalization.CultureInfo.InvariantCulture)} m"));
        }

        if (jets.HoleRadiusM < jets.MinimumHoleRadiusM)
        {
            errors.Add(new ScenarioError(section.LocationOf("hole_radius"), "probe.jets.hole_radius", "the hole radius is below minimum_hole_radius"));
        }

        if (jets.InitialHeatW > jets.MaxHeatW)
        {
            errors.Add(new ScenarioError(section.LocationOf("initial_power"), "probe.jets.initial_power", "the initial jet power is above the jets' heat"));
        }
    }
}
