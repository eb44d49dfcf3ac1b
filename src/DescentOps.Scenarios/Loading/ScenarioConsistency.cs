using DescentOps.Scenarios.Model;

namespace DescentOps.Scenarios.Loading;

/// <summary>
/// Rules that tie fields of different sections together, which the per-field bounds cannot express. Each section's own
/// cross-field rules live with its reader and are called from here, in a fixed order (the order errors are listed in).
/// </summary>
internal static class ScenarioConsistency
{
    /// <summary>Adds to <paramref name="errors"/> every rule the scenario breaks, located at the field in <paramref name="root"/>.</summary>
    internal static void Check(Scenario scenario, BoundSection root, List<ScenarioError> errors)
    {
        var shell = root.Section("shell");
        CheckIntervals(shell.List("layers"), scenario.Shell.Layers.Select(l => (l.TopM, l.BottomM)).ToList(), "shell.layers", scenario.Shell.ThicknessM, errors);
        CheckIntervals(shell.List("debris_bands"), scenario.Shell.DebrisBands.Select(b => (b.TopM, b.BottomM)).ToList(), "shell.debris_bands", scenario.Shell.ThicknessM, errors);
        if (scenario.Shell.Convection is { } convection && shell.OptionalSection("convection") is { } convectionSection)
        {
            if (convection.TopM + convection.BasalBoundaryM >= scenario.Shell.ThicknessM)
            {
                errors.Add(new ScenarioError(convectionSection.LocationOf("top"), "shell.convection.top", "the lid and the basal boundary layer leave no room for the convecting layer within the shell"));
            }

            if (convection.TemperatureK <= scenario.Shell.SurfaceTemperatureK)
            {
                errors.Add(new ScenarioError(convectionSection.LocationOf("temperature"), "shell.convection.temperature", "a convecting layer is warmer than the surface"));
            }
        }

        if (scenario.Shell.FracturedToM > scenario.Shell.ThicknessM)
        {
            errors.Add(new ScenarioError(shell.LocationOf("fractured_to"), "shell.fractured_to", "the fractured zone cannot reach below the shell's thickness"));
        }

        var faults = root.List("faults");
        for (var i = 0; i < faults.Count; i++)
        {
            if (faults[i].OptionalText("vehicle") is { } name && scenario.Vehicles.All(v => v.Name != name))
            {
                errors.Add(new ScenarioError(faults[i].LocationOf("vehicle"), $"faults[{i}].vehicle", $"there is no vehicle named '{name}'"));
            }
            if (FaultReader.RelayNumber(faults[i]) is > 0 and var n && n > (scenario.Relays?.Carried ?? 0))
            {
                errors.Add(new ScenarioError(faults[i].LocationOf("relay"), $"faults[{i}].relay", $"the probe carries {scenario.Relays?.Carried ?? 0} relays, so there is no relay {n}"));
            }
        }

        if (scenario.Relays is { } plan && root.OptionalSection("relays") is { } relays)
        {
            if (plan.IntervalM is not null && plan.DropDepthsM.Count > 0)
            {
                errors.Add(new ScenarioError(relays.LocationOf("interval"), "relays.interval", "give 'interval' or 'drops', not both"));
            }

            if (plan.DropDepthsM.Count > plan.Carried)
            {
                errors.Add(new ScenarioError(relays.LocationOf("carried"), "relays.carried", $"{plan.DropDepthsM.Count} drops are planned but only {plan.Carried} relays are carried"));
            }
        }

        var vehicles = root.List("vehicles");
        for (var i = 0; i < scenario.Vehicles.Count; i++)
        {
            VehicleReader.Check(scenario.Vehicles[i], vehicles[i], $"vehicles[{i}]", errors);
        }

        if (scenario.Power is { } power) PowerReader.Check(power, root.Section("power"), scenario.Probe.Jets is not null, errors);
        JetsReader.Check(scenario, root, errors);
        StationReader.Check(scenario.Station, root.Section("station"), errors);
    }

    /// <summary>Depth intervals of the shell: top above bottom, inside the shell, and none overlapping another.</summary>
    private static void CheckIntervals(IReadOnlyList<BoundSection> sections, List<(double Top, double Bottom)> intervals, string path, double thicknessM, List<ScenarioError> errors)
    {
        for (var i = 0; i < intervals.Count; i++)
        {
            var (top, bottom) = intervals[i];
            if (bottom <= top)
            {
                errors.Add(new ScenarioError(sections[i].LocationOf("bottom"), $"{path}[{i}].bottom", "the bottom must be deeper than the top"));
            }
            else if (bottom > thicknessM)
            {
                errors.Add(new ScenarioError(sections[i].LocationOf("bottom"), $"{path}[{i}].bottom", "the bottom lies below the shell's thickness"));
            }

            for (var j = 0; j < i; j++)
            {
                if (top < intervals[j].Bottom && intervals[j].Top < bottom)
                {
                    errors.Add(new ScenarioError(sections[i].Location, $"{path}[{i}]", $"overlaps {path}[{j}]"));
                }
            }
        }
    }
}
