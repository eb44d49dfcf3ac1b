using System.CommandLine;
using DescentOps.Physics.Ice;
using DescentOps.Scenarios.Format;

namespace DescentOps.Cli.Commands.Physics;

/// <summary><c>physics ice --temperature T --pressure P</c>: properties of ice Ih at one state.</summary>
internal static class IceSubcommand
{
    public static Command Create()
    {
        var temperature = QuantityOption.Required("--temperature", QuantityKind.Temperature, "Ice temperature, 50 K to 273.16 K.");
        var pressure = QuantityOption.Required("--pressure", QuantityKind.Pressure, "Absolute pressure, 0 to 208.566 MPa (the Ih–III–liquid triple point).");
        var fit = new Option<IceConductivityFit>("--conductivity-fit")
        {
            Description = "Thermal conductivity fit: AnderssonInaba2005 (default), Klinger1980, PetrenkoWhitworth1999, Yen1981.",
            DefaultValueFactory = _ => IceConductivityFit.AnderssonInaba2005,
        };
        var json = PhysicsAction.JsonOption();
        var command = new Command("ice", "Density, heat capacity, conductivity and phase boundaries of ice Ih (IAPWS R10-06, R14-08). Melting temperature is null below the triple-point pressure, where ice sublimates instead.")
        {
            temperature.Option, pressure.Option, fit, json,
        };
        var map = new ParameterOptions { { "temperatureK", temperature }, { "pressurePa", pressure } };
        command.SetAction(parse => PhysicsAction.Run("ice", parse, json, p =>
        {
            var t = temperature.Value(p);
            var pa = pressure.Value(p);
            var state = IceGibbsFunction.Evaluate(t, pa);
            var chosen = p.GetValue(fit);
            var conductivity = IceConductivity.ConductivityWPerMK(t, chosen);
            var sublimation = SublimationCurve.PressurePa(t);
            // Below the triple-point pressure there is no liquid to melt into: that is an answer, not an error.
            var melting = pa >= TriplePoint.PressurePa ? MeltingCurve.TemperatureK(pa) : double.NaN;
            return new PhysicsReport("ice Ih")
                .Number("temperature_k", "temperature", t, "K")
                .Number("pressure_pa", "pressure", pa, "Pa")
                .Number("density_kg_m3", "density (R10-06)", state.DensityKgPerM3, "kg/m³")
                .Number("heat_capacity_j_kg_k", "isobaric heat capacity (R10-06)", state.SpecificHeatJPerKgK, "J/(kg·K)")
                .Number("thermal_conductivity_w_m_k", $"thermal conductivity ({chosen})", conductivity, "W/(m·K)")
                .Number("thermal_diffusivity_m2_s", "thermal diffusivity", conductivity / (state.DensityKgPerM3 * state.SpecificHeatJPerKgK), "m²/s")
                .Number("melting_temperature_k", "melting temperature at p (R14-08)", melting, "K")
                .Number("sublimation_pressure_pa", "sublimation pressure at T (R14-08)", sublimation, "Pa")
                .Text("conductivity_fit", "conductivity fit", chosen.ToString());
        }, map));
        return command;
    }
}
