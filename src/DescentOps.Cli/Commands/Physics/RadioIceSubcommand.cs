using System.CommandLine;
using DescentOps.Physics.Links;
using DescentOps.Scenarios.Format;

namespace DescentOps.Cli.Commands.Physics;

/// <summary><c>physics radio-ice</c>: one-way radio loss through ice of one temperature and chemistry.</summary>
internal static class RadioIceSubcommand
{
    public static Command Create()
    {
        var temperature = QuantityOption.Required("--temperature", QuantityKind.Temperature, "Ice temperature, 90 K to 273.15 K.");
        var distance = QuantityOption.Required("--distance", QuantityKind.Length, "Path length through the ice.");
        var frequency = QuantityOption.Required("--frequency", QuantityKind.Frequency, "Radio frequency, 1 MHz to 1 GHz.");
        var parameters = new Option<string>("--parameters")
        {
            Description = "Conductivity parameter set: M07-std (default, MacGregor et al. 2007), M07-adj, W97 (Wolff et al. 1997).",
            DefaultValueFactory = _ => IceConductivityParameters.MacGregor2007Standard.Name,
        };
        parameters.AcceptOnlyFromAmong(ParameterSets.Select(s => s.Name).ToArray());
        var hydrogen = new Option<double>("--acidity") { Description = "Hydrogen-ion concentration of the ice, µmol/L. Default: 0 (pure ice).", DefaultValueFactory = _ => 0.0 };
        var chloride = new Option<double>("--chloride") { Description = "Chloride concentration of the ice, µmol/L. Default: 0.", DefaultValueFactory = _ => 0.0 };
        var ammonium = new Option<double>("--ammonium") { Description = "Ammonium concentration of the ice, µmol/L. Default: 0.", DefaultValueFactory = _ => 0.0 };
        var json = PhysicsAction.JsonOption();
        var command = new Command(
            "radio-ice",
            "Radio attenuation of ice from its Arrhenius conductivity, N_a = 10·log10(e)·σ/(ε0·c·√ε′), and the one-way path loss "
            + "path_loss_db = spreading_loss_db (free space with the wavelength shortened by √ε′) + absorption_loss_db (N_a·d).")
        {
            temperature.Option, distance.Option, frequency.Option, parameters, hydrogen, chloride, ammonium, json,
        };
        var map = new ParameterOptions
        {
            { "temperatureK", temperature }, { "distanceM", distance }, { "frequencyHz", frequency },
            { "HydrogenIonMolPerM3", hydrogen }, { "ChlorideMolPerM3", chloride }, { "AmmoniumMolPerM3", ammonium },
        };
        command.SetAction(parse => PhysicsAction.Run("radio-ice", parse, json, p =>
        {
            var set = ParameterSets.Single(s => s.Name == p.GetValue(parameters));
            // 1 µmol/L = 1e-3 mol/m³.
            var impurities = new IceImpurities(p.GetValue(hydrogen) * 1e-3, p.GetValue(chloride) * 1e-3, p.GetValue(ammonium) * 1e-3);
            var t = temperature.Value(p);
            var d = distance.Value(p);
            var perM = IceRadioAttenuation.DbPerM(t, set, impurities);
            var spreading = IceRadioLinkBudget.FreeSpaceLossDb(d, frequency.Value(p), set.RelativePermittivity);
            return new PhysicsReport("radio through ice")
                .Number("conductivity_s_m", "high-frequency conductivity", IceElectricalConductivity.SPerM(t, set, impurities), "S/m")
                .Number("attenuation_db_per_km", "attenuation", perM * 1e3, "dB/km")
                .Number("spreading_loss_db", "spreading loss in ice", spreading, "dB")
                .Number("absorption_loss_db", "absorption loss", perM * d, "dB")
                .Number("path_loss_db", "one-way path loss", spreading + (perM * d), "dB")
                .Text("parameters", "parameter set", set.Name);
        }, map));
        return command;
    }

    private static IReadOnlyList<IceConductivityParameters> ParameterSets { get; } =
        [IceConductivityParameters.MacGregor2007Standard, IceConductivityParameters.MacGregor2007Adjusted, IceConductivityParameters.Wolff1997];
}
