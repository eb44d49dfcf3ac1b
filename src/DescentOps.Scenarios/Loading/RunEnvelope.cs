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
/// acoustic link's water), and a state outside a model's declared range is refused with the field that sets it, the
/// value, the model and its range. The mission's preflight calls it first, so <c>check</c> and <c>run</c> refuse alike
/// and a run never discovers at breakthrough what could have been said before it started.
/// </summary>
public static class RunEnvelope
{
    /// <summary>Depths the probe's steady descent is checked at, as shares of the shell (the base itself, just above it).</summary>
    private static readonly double[] ProbeDepthShares = [0.0, 0.25, 0.5, 0.75, 0.999];

    /// <summary>
    /// The refusals, each at the field that sets the state a model would be taken out of range by; one per field (the
    /// first model it takes out of range), since changing the field changes what the later models see.
    /// </summary>
    public static IReadOnlyList<ScenarioError> Errors(Scenario scenario)
    {
        ArgumentNullException.ThrowIfNull(scenario);
        var errors = new List<ScenarioError>();
        Check(scenario, errors);
        return [.. errors.DistinctBy(error => error.FieldPath, StringComparer.Ordinal)];
    }

    private static void Check(Scenario scenario, List<ScenarioError> errors)
    {
        var shell = Guard(scenario, errors, "shell.thickness", () => ScenarioShell.Build(scenario));
        if (shell is null) return;

        CheckProbe(scenario, shell, errors);

        var temperaturePath = scenario.Shell.OceanTemperatureK is null && scenario.Acoustics is not null ? "acoustics.ocean_temperature" : "shell.ocean_temperature";
        var ocean = Guard(scenario, errors, "shell", () => ScenarioOcean.Build(scenario, shell), refusal => refusal.Range.Quantity switch
        {
            "temperature" => (temperaturePath, FormattableString.Invariant($"the ocean is colder than its freezing point {refusal.Range.Minimum:F4} K (TEOS-10, air-free, at the ocean's salinity and the {shell.BasePressurePa / 1e6:F2} MPa under the shell), or warmer than 40 °C")),
            "absolute salinity" => ("shell.ocean_salinity", null),
            _ => ("shell.thickness", FormattableString.Invariant($"the pressure under the shell, {shell.BasePressurePa / 1e6:F2} MPa, takes seawater out of its range")),
        });
        if (ocean is null) return;

        for (var i = 0; i < scenario.Vehicles.Count; i++)
        {
            var vehicle = scenario.Vehicles[i];
            if (vehicle.Task == VehicleTask.IceMapping) continue;
            var path = $"vehicles[{i}].profile_depth";
            Guard(scenario, errors, path, () => ocean.SeaPressureBelowPa(vehicle.ProfileDepthM),
                _ => (path, FormattableString.Invariant($"at {vehicle.ProfileDepthM:F0} m below the shell the water is beyond TEOS-10's pressure range")));
        }

        if (scenario.Acoustics is { } acoustics) CheckAcoustics(scenario, acoustics, shell, ocean, errors);
    }

    /// <summary>The probe's steady descent, with its largest head power, from the surface to just above the base.</summary>
    private static void CheckProbe(Scenario scenario, IceShell shell, List<ScenarioError> errors)
    {
        var model = Guard(scenario, errors, "probe", () => new ProbeDescentModel(shell, new ProbeGeometry(scenario.Probe.RadiusM, scenario.Probe.LengthM, scenario.Probe.MassKg)));
        if (model is null) return;
        foreach (var share in ProbeDepthShares)
        {
            var depth = share * shell.ThicknessM;
            var ok = Guard(scenario, errors, "probe", () => model.Rate(depth, scenario.Probe.MaxHeadPowerW, scenario.Probe.WallPowerW),
                refusal => (RangeRefusal.FieldOf(refusal.ParamName), FormattableString.Invariant($"at {depth:F0} m ({shell.PressurePa(depth) / 1e6:F2} MPa, {shell.TemperatureK(depth):F1} K) the probe's descent leaves a model's range")));
            if (ok is null) return;
        }
    }

    private static void CheckAcoustics(Scenario scenario, AcousticsModel acoustics, IceShell shell, OceanUnderShell ocean, List<ScenarioError> errors)
    {
        var temperature = ScenarioOcean.AcousticTemperatureK(acoustics, ocean);
        var temperatureField = acoustics.OceanTemperatureK is null ? "shell.ocean_temperature" : "acoustics.ocean_temperature";
        if (acoustics.OceanTemperatureK is { } given && given < ocean.Water.FreezingTemperatureK)
        {
            errors.Add(RangeRefusal.Error(scenario, "acoustics.ocean_temperature",
                FormattableString.Invariant($"{given:R} K is colder than the ocean's freezing point {ocean.Water.FreezingTemperatureK:F4} K (TEOS-10, air-free, at the ocean's salinity and the {shell.BasePressurePa / 1e6:F2} MPa under the shell)")));
            return;
        }

        Guard(scenario, errors, temperatureField, () => Teos10Seawater.At(ocean.Water.AbsoluteSalinityGPerKg, ocean.Water.SeaPressurePa, temperature));

        var salinity = ScenarioOcean.PracticalSalinity(scenario);
        var depth = ScenarioOcean.EarthEquivalentDepthM(shell);
        Guard(scenario, errors, "acoustics", () => acoustics.Formula == AbsorptionFormula.AinslieMcColm
                ? SeawaterAbsorption.AinslieMcColmDbPerKm(acoustics.FrequencyHz, temperature, salinity, depth, acoustics.PH)
                : SeawaterAbsorption.FrancoisGarrisonDbPerKm(acoustics.FrequencyHz, temperature, salinity, depth, acoustics.PH),
            refusal => refusal.Range.Quantity switch
            {
                "depthM" => ("shell.thickness", FormattableString.Invariant($"the pressure under the shell ({shell.BasePressurePa / 1e6:F2} MPa) is the Earth depth {depth:F0} m, which the absorption formula (acoustics.absorption) does not cover")),
                "temperatureK" => (temperatureField, "the water's temperature is outside the absorption formula's range (acoustics.absorption)"),
                "practicalSalinity" => ("shell.ocean_salinity", "the ocean's salinity is outside the absorption formula's range (acoustics.absorption)"),
                "frequencyHz" => ("acoustics.frequency", null),
                "pH" => ("acoustics.ph", null),
                _ => ("acoustics", null),
            });
    }

    private static T? Guard<T>(Scenario scenario, List<ScenarioError> errors, string path, Func<T> model, Func<ModelRangeException, (string Path, string? Why)>? place = null)
        where T : class
    {
        try
        {
            return model();
        }
        catch (ModelRangeException refusal)
        {
            var (field, why) = place?.Invoke(refusal) ?? (FieldFor(path, refusal), null);
            errors.Add(RangeRefusal.Error(scenario, field, refusal, why));
            return null;
        }
        catch (ArgumentException refusal)
        {
            // A model's other refusals (a probe that floats, a lid with no room for its gradient) are the run's too.
            errors.Add(RangeRefusal.Error(scenario, FieldFor(path, refusal), refusal));
            return null;
        }
    }

    /// <summary>The shell's and the probe's models name the quantity they refused; it points to the field more closely than the section.</summary>
    private static string FieldFor(string path, ArgumentException refusal) =>
        path is "probe" or "shell.thickness" && RangeRefusal.FieldOf(refusal.ParamName) is var named && named != "probe" ? named : path;

    private static double? Guard(Scenario scenario, List<ScenarioError> errors, string path, Func<double> model, Func<ModelRangeException, (string Path, string? Why)>? place = null) =>
        Guard<object>(scenario, errors, path, () => model(), place) is double value ? value : null;

    private static object? Guard(Scenario scenario, List<ScenarioError> errors, string path, Func<DescentRate> model, Func<ModelRangeException, (string Path, string? Why)>? place = null) =>
        Guard<object>(scenario, errors, path, () => model(), place);
}
