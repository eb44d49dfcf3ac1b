using DescentOps.Physics;
using DescentOps.Physics.Acoustics;
using DescentOps.Physics.Descent;
using DescentOps.Physics.Seawater;
using DescentOps.Physics.Shell;
using DescentOps.Scenarios.Envelope;
using DescentOps.Scenarios.Model;

namespace DescentOps.Scenarios.Loading;

/// <summary>
/// Before a run: every model the run will call is evaluated at the extreme states the scenario takes it to (the shell's
/// surface and base, the probe's pressure at the base, the ocean under the shell, the vehicles' deepest point, the
/// acoustic link's water), and a state outside a model's declared range is refused at load with the field that sets it,
/// the value, the model and its range. A run never discovers at breakthrough what the loader could have said.
/// </summary>
internal static class RunEnvelope
{
    /// <summary>Depths the probe's steady descent is checked at, as shares of the shell (the base itself, just above it).</summary>
    private static readonly double[] ProbeDepthShares = [0.0, 0.25, 0.5, 0.75, 0.999];

    public static void Check(Scenario scenario, BoundSection root, List<ScenarioError> errors)
    {
        var shellSection = root.Section("shell");
        var shell = Guard(errors, shellSection.LocationOf("thickness"), "shell.thickness", () => ScenarioShell.Build(scenario));
        if (shell is null) return;

        CheckProbe(scenario, shell, root.Section("probe"), errors);

        var (temperaturePath, temperatureAt) = scenario.Shell.OceanTemperatureK is null && root.OptionalSection("acoustics") is { } given
            ? ("acoustics.ocean_temperature", given.LocationOf("ocean_temperature"))
            : ("shell.ocean_temperature", shellSection.LocationOf("ocean_temperature"));
        var ocean = Guard(errors, shellSection.Location, "shell", () => ScenarioOcean.Build(scenario, shell), refusal => refusal.Range.Quantity switch
        {
            "temperature" => (temperaturePath, temperatureAt, FormattableString.Invariant($"the ocean is colder than its freezing point {refusal.Range.Minimum:F4} K (TEOS-10, air-free, at the ocean's salinity and the {shell.BasePressurePa / 1e6:F2} MPa under the shell), or warmer than 40 °C")),
            "absolute salinity" => ("shell.ocean_salinity", shellSection.LocationOf("ocean_salinity"), null),
            _ => ("shell.thickness", shellSection.LocationOf("thickness"), $"the pressure under the shell, {shell.BasePressurePa / 1e6:F2} MPa, takes seawater out of its range"),
        });
        if (ocean is null) return;

        var vehicles = root.List("vehicles");
        for (var i = 0; i < scenario.Vehicles.Count; i++)
        {
            var vehicle = scenario.Vehicles[i];
            if (vehicle.Task == VehicleTask.IceMapping) continue;
            Guard(errors, vehicles[i].LocationOf("profile_depth"), $"vehicles[{i}].profile_depth", () => ocean.SeaPressureBelowPa(vehicle.ProfileDepthM),
                _ => ($"vehicles[{i}].profile_depth", vehicles[i].LocationOf("profile_depth"), $"at {vehicle.ProfileDepthM:F0} m below the shell the water is beyond TEOS-10's pressure range"));
        }

        if (scenario.Acoustics is { } acoustics && root.OptionalSection("acoustics") is { } section) CheckAcoustics(scenario, acoustics, shell, ocean, section, shellSection, errors);
    }

    /// <summary>The probe's steady descent, with its largest head power, from the surface to just above the base.</summary>
    private static void CheckProbe(Scenario scenario, IceShell shell, BoundSection probe, List<ScenarioError> errors)
    {
        var model = Guard(errors, probe.Location, "probe", () => new ProbeDescentModel(shell, new ProbeGeometry(scenario.Probe.RadiusM, scenario.Probe.LengthM, scenario.Probe.MassKg)));
        if (model is null) return;
        foreach (var share in ProbeDepthShares)
        {
            var depth = share * shell.ThicknessM;
            var ok = Guard(errors, probe.LocationOf("max_head_power"), "probe", () => model.Rate(depth, scenario.Probe.MaxHeadPowerW, scenario.Probe.WallPowerW),
                refusal => ("probe", probe.Location, $"at {depth:F0} m ({shell.PressurePa(depth) / 1e6:F2} MPa, {shell.TemperatureK(depth):F1} K) the probe's descent leaves a model's range"));
            if (ok is null) return;
        }
    }

    private static void CheckAcoustics(Scenario scenario, AcousticsModel acoustics, IceShell shell, OceanUnderShell ocean, BoundSection section, BoundSection shellSection, List<ScenarioError> errors)
    {
        var temperature = ScenarioOcean.AcousticTemperatureK(acoustics, ocean);
        var temperatureField = acoustics.OceanTemperatureK is null ? ("shell.ocean_temperature", shellSection.LocationOf("ocean_temperature")) : ("acoustics.ocean_temperature", section.LocationOf("ocean_temperature"));
        if (acoustics.OceanTemperatureK is { } given && given < ocean.Water.FreezingTemperatureK)
        {
            errors.Add(new ScenarioError(section.LocationOf("ocean_temperature"), "acoustics.ocean_temperature",
                FormattableString.Invariant($"{given:R} K is colder than the ocean's freezing point {ocean.Water.FreezingTemperatureK:F4} K (TEOS-10, air-free, at the ocean's salinity and the {shell.BasePressurePa / 1e6:F2} MPa under the shell)")));
            return;
        }

        Guard(errors, temperatureField.Item2, temperatureField.Item1, () => Teos10Seawater.At(ocean.Water.AbsoluteSalinityGPerKg, ocean.Water.SeaPressurePa, temperature));

        var salinity = ScenarioOcean.PracticalSalinity(scenario);
        var depth = ScenarioOcean.EarthEquivalentDepthM(shell);
        Guard(errors, section.Location, "acoustics", () => acoustics.Formula == AbsorptionFormula.AinslieMcColm
                ? SeawaterAbsorption.AinslieMcColmDbPerKm(acoustics.FrequencyHz, temperature, salinity, depth, acoustics.PH)
                : SeawaterAbsorption.FrancoisGarrisonDbPerKm(acoustics.FrequencyHz, temperature, salinity, depth, acoustics.PH),
            refusal => refusal.Range.Quantity switch
            {
                "depthM" => ("shell.thickness", shellSection.LocationOf("thickness"), FormattableString.Invariant($"the pressure under the shell ({shell.BasePressurePa / 1e6:F2} MPa) is the Earth depth {depth:F0} m, which the absorption formula (acoustics.absorption) does not cover")),
                "temperatureK" => (temperatureField.Item1, temperatureField.Item2, "the water's temperature is outside the absorption formula's range (acoustics.absorption)"),
                "practicalSalinity" => ("shell.ocean_salinity", shellSection.LocationOf("ocean_salinity"), "the ocean's salinity is outside the absorption formula's range (acoustics.absorption)"),
                "frequencyHz" => ("acoustics.frequency", section.LocationOf("frequency"), null),
                "pH" => ("acoustics.ph", section.LocationOf("ph"), null),
                _ => ("acoustics", section.Location, null),
            });
    }

    private static T? Guard<T>(List<ScenarioError> errors, SourceLocation at, string path, Func<T> model, Func<ModelRangeException, (string Path, SourceLocation At, string? Why)>? place = null)
        where T : class
    {
        try
        {
            return model();
        }
        catch (ModelRangeException refusal)
        {
            var (field, location, why) = place?.Invoke(refusal) ?? (path, at, null);
            errors.Add(new ScenarioError(location, field, why is null ? refusal.Sentence : $"{why}: {refusal.Sentence}"));
            return null;
        }
    }

    private static double? Guard(List<ScenarioError> errors, SourceLocation at, string path, Func<double> model, Func<ModelRangeException, (string Path, SourceLocation At, string? Why)>? place = null) =>
        Guard<object>(errors, at, path, () => model(), place) is double value ? value : null;

    private static object? Guard(List<ScenarioError> errors, SourceLocation at, string path, Func<DescentRate> model, Func<ModelRangeException, (string Path, SourceLocation At, string? Why)>? place = null) =>
        Guard<object>(errors, at, path, () => model(), place);
}
