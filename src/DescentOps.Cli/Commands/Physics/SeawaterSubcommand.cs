using System.CommandLine;
using DescentOps.Physics.Ocean;
using DescentOps.Physics.Seawater;
using DescentOps.Physics.Water;
using DescentOps.Scenarios.Format;

namespace DescentOps.Cli.Commands.Physics;

/// <summary>
/// <c>physics seawater</c>: TEOS-10 by default (any salinity 0–42 g/kg, any sea pressure 0–100 MPa, at the freezing
/// point unless a temperature is given); the older UNESCO 1983 / EOS-80 formulas only when asked for by name.
/// </summary>
internal static class SeawaterSubcommand
{
    private const string Teos10 = "teos-10";
    private const string Eos80 = "eos-80";

    public static Command Create()
    {
        var salinity = new SalinityOption("--salinity", "Salinity of the water, 0 to 42 g/kg (fresh water included).");
        var pressure = QuantityOption.Required("--pressure", QuantityKind.Pressure, "Sea pressure: absolute pressure less one standard atmosphere (101325 Pa), 0 to 100 MPa. Under a shell on an airless body, the overburden less 101325 Pa.");
        var temperature = QuantityOption.NotRequired("--temperature", QuantityKind.Temperature, "In-situ temperature (ITS-90), from the freezing point to 40 °C; without it, the water is at its freezing point.");
        var standard = new Option<string>("--standard")
        {
            Description = $"'{Teos10}' (default): TEOS-10, the international thermodynamic equation of seawater 2010. '{Eos80}': the older UNESCO 1983 freezing point, Chen-Millero sound speed and EOS-80 density (practical salinity 4–40 for the freezing point, 0–5 MPa, −2 to 40 °C).",
            DefaultValueFactory = _ => Teos10,
        };
        standard.AcceptOnlyFromAmong(Teos10, Eos80);
        var terrestrialDepth = QuantityOption.NotRequired("--terrestrial-depth", QuantityKind.Length, "Also give the Mackenzie (1981) sound speed at this depth of a terrestrial ocean (0 to 8000 m; needs salinity 30 to 40 and −2 °C to 30 °C).");
        var json = PhysicsAction.JsonOption();
        var command = new Command(
            "seawater",
            "Freezing temperature, Conservative Temperature, in-situ density and sound speed of seawater by TEOS-10 (or, by name, UNESCO 1983 / EOS-80).")
        {
            salinity.Option, pressure.Option, temperature.Option, standard, terrestrialDepth.Option, json,
        };
        var map = new ParameterOptions
        {
            { "practicalSalinity", salinity }, { "seaPressurePa", pressure }, { "temperatureK", temperature }, { "earthDepthM", terrestrialDepth },
            { "absolute salinity", salinity }, { "sea pressure", pressure }, { "temperature", temperature },
        };
        command.SetAction(parse => PhysicsAction.Run("seawater", parse, json, p =>
        {
            var s = salinity.PracticalSalinity(p);
            var pa = pressure.Value(p);
            var t = temperature.Optional(p);
            var report = p.GetValue(standard) == Eos80 ? Older(s, pa, t ?? throw new UsageException("--temperature is required with --standard eos-80.")) : Teos(s, pa, t);
            return terrestrialDepth.Optional(p) is { } depth && t is { } tk
                ? report.Number("sound_speed_mackenzie_m_s", "sound speed (Mackenzie 1981, terrestrial depth)", SoundSpeed.MackenzieMPerS(s, tk, depth), "m/s")
                : report;
        }, map));
        return command;
    }

    private static PhysicsReport Teos(double practicalSalinity, double seaPressurePa, double? temperatureK)
    {
        var sa = AbsoluteSalinity.FromPracticalGPerKg(practicalSalinity);
        var state = temperatureK is { } t ? Teos10Seawater.At(sa, seaPressurePa, t) : Teos10Seawater.AtFreezing(sa, seaPressurePa);
        return new PhysicsReport("seawater (TEOS-10)")
            .Text("standard", "standard", Teos10)
            .Number("absolute_salinity_g_kg", "absolute salinity", sa, "g/kg")
            .Number("practical_salinity", "practical salinity", practicalSalinity, "")
            .Number("pressure_pa", "sea pressure", seaPressurePa, "Pa")
            .Number("temperature_k", temperatureK is null ? "temperature (at the freezing point)" : "temperature (in situ)", state.TemperatureK, "K")
            .Number("conservative_temperature_k", "Conservative Temperature", state.ConservativeTemperatureK, "K")
            .Number("potential_temperature_k", "potential temperature (0 dbar)", state.PotentialTemperatureK, "K")
            .Number("freezing_temperature_k", "freezing temperature (air-free)", state.FreezingTemperatureK, "K")
            .Number("density_kg_m3", "in-situ density (Gibbs function)", state.DensityKgPerM3, "kg/m³")
            .Number("sound_speed_m_s", "sound speed (Gibbs function)", state.SoundSpeedMPerS, "m/s")
            .Number("density_75term_kg_m3", "in-situ density (75-term polynomial)", state.PolynomialDensityKgPerM3, "kg/m³")
            .Number("sound_speed_75term_m_s", "sound speed (75-term polynomial)", state.PolynomialSoundSpeedMPerS, "m/s")
            .Number("specific_heat_j_kg_k", "specific heat", state.SpecificHeatJPerKgK, "J/(kg K)");
    }

    private static PhysicsReport Older(double practicalSalinity, double seaPressurePa, double temperatureK)
    {
        var density = SeawaterDensity.Eos80(practicalSalinity, temperatureK, seaPressurePa);
        return new PhysicsReport("seawater (UNESCO 1983 / EOS-80)")
            .Text("standard", "standard", Eos80)
            .Number("practical_salinity", "practical salinity", practicalSalinity, "")
            .Number("pressure_pa", "sea pressure", seaPressurePa, "Pa")
            .Number("temperature_k", "temperature", temperatureK, "K")
            .Number("freezing_temperature_k", "freezing temperature (UNESCO 1983)", SeawaterFreezingPoint.TemperatureK(practicalSalinity, seaPressurePa), "K")
            .Number("sound_speed_m_s", "sound speed (Chen-Millero)", SoundSpeed.UnescoMPerS(practicalSalinity, temperatureK, seaPressurePa), "m/s")
            .Number("density_kg_m3", "in-situ density (EOS-80)", density.DensityKgPerM3, "kg/m³")
            .Number("secant_bulk_modulus_pa", "secant bulk modulus (EOS-80)", density.SecantBulkModulusPa, "Pa");
    }
}
