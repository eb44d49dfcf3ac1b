using System.CommandLine;
using DescentOps.Physics.Ocean;
using DescentOps.Physics.Water;
using DescentOps.Scenarios.Format;

namespace DescentOps.Cli.Commands.Physics;

/// <summary><c>physics seawater</c>: freezing point, sound speed and density of seawater (UNESCO 1983 / EOS-80).</summary>
internal static class SeawaterSubcommand
{
    public static Command Create()
    {
        var salinity = new SalinityOption("--salinity", "Salinity of the water; the freezing point needs 4 to 40.");
        var pressure = QuantityOption.Required("--pressure", QuantityKind.Pressure, "Sea pressure as the UNESCO formulas define it: absolute pressure less one standard atmosphere in a terrestrial ocean; under an ice shell on an airless body, the absolute pressure (ice overburden plus the water above). The freezing point needs 0 to 5 MPa (500 dbar).");
        var temperature = QuantityOption.Required("--temperature", QuantityKind.Temperature, "In-situ temperature (ITS-90), −2 °C to 40 °C.");
        var terrestrialDepth = QuantityOption.NotRequired("--terrestrial-depth", QuantityKind.Length, "Also give the Mackenzie (1981) sound speed at this depth of a terrestrial ocean (0 to 8000 m; needs salinity 30 to 40 and −2 °C to 30 °C).");
        var json = PhysicsAction.JsonOption();
        var command = new Command(
            "seawater",
            "Freezing temperature (UNESCO 1983, Millero-Leung), sound speed (Chen-Millero, UNESCO 1983) and in-situ density (EOS-80) of seawater at practical salinity S.")
        {
            salinity.Option, pressure.Option, temperature.Option, terrestrialDepth.Option, json,
        };
        var map = new Dictionary<string, string>
        {
            ["practicalSalinity"] = salinity.Name, ["seaPressurePa"] = pressure.Name, ["temperatureK"] = temperature.Name, ["earthDepthM"] = terrestrialDepth.Name,
        };
        command.SetAction(parse => PhysicsAction.Run("seawater", parse, json, p =>
        {
            var s = salinity.PracticalSalinity(p);
            var pa = pressure.Value(p);
            var t = temperature.Value(p);
            var density = SeawaterDensity.Eos80(s, t, pa);
            var report = new PhysicsReport("seawater")
                .Number("practical_salinity", "practical salinity", s, "")
                .Number("pressure_pa", "sea pressure", pa, "Pa")
                .Number("temperature_k", "temperature", t, "K")
                .Number("freezing_temperature_k", "freezing temperature (UNESCO 1983)", SeawaterFreezingPoint.TemperatureK(s, pa), "K")
                .Number("sound_speed_m_s", "sound speed (Chen-Millero)", SoundSpeed.UnescoMPerS(s, t, pa), "m/s")
                .Number("density_kg_m3", "in-situ density (EOS-80)", density.DensityKgPerM3, "kg/m³")
                .Number("secant_bulk_modulus_pa", "secant bulk modulus (EOS-80)", density.SecantBulkModulusPa, "Pa");
            return terrestrialDepth.Optional(p) is { } depth
                ? report.Number("sound_speed_mackenzie_m_s", "sound speed (Mackenzie 1981, terrestrial depth)", SoundSpeed.MackenzieMPerS(s, t, depth), "m/s")
                : report;
        }, map));
        return command;
    }
}
