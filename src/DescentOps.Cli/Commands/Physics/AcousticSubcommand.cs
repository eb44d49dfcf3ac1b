using System.CommandLine;
using DescentOps.Physics.Acoustics;
using DescentOps.Scenarios.Format;

namespace DescentOps.Cli.Commands.Physics;

/// <summary>
/// <c>physics acoustic</c>: absorption and transmission loss of sound in seawater at one range and, with the three
/// levels, the margin of an acoustic modem link by the passive sonar equation.
/// </summary>
internal static class AcousticSubcommand
{
    public const double DefaultPh = 8.0;

    public const double DefaultSpreadingExponent = 2.0;

    public static Command Create()
    {
        var frequency = QuantityOption.Required("--frequency", QuantityKind.Frequency, "Carrier frequency.");
        var range = QuantityOption.Required("--range", QuantityKind.Length, "Distance between source and receiver, at least 1 m.");
        var temperature = QuantityOption.Required("--temperature", QuantityKind.Temperature, "Water temperature.");
        var salinity = new SalinityOption("--salinity", "Salinity of the water.");
        var depth = QuantityOption.Required("--depth", QuantityKind.Length, "Depth in the water column (the formulas' depth in a terrestrial ocean).");
        var formula = new Option<AbsorptionFormula>("--absorption-formula")
        {
            Description = "AinslieMcColm (default; salinity 5–50, −6 to 35 °C, 0–7 km), FrancoisGarrison (salinity 30–35, −2 to 22 °C, 0–3.5 km) or Thorp (frequency only).",
            DefaultValueFactory = _ => AbsorptionFormula.AinslieMcColm,
        };
        var ph = new Option<double>("--ph") { Description = "pH of the water, 7.7 to 8.3. Default: 8.", DefaultValueFactory = _ => DefaultPh };
        var spreading = new Option<double>("--spreading")
        {
            Description = "Spreading exponent k in TL = k·10·log10(r/1 m) + α·r: 2 spherical (default), 1 cylindrical, 1.5 between.",
            DefaultValueFactory = _ => DefaultSpreadingExponent,
        };
        var sourceLevel = LevelOption.NotRequired("--source-level", "dB", "Source level SL, dB re 1 µPa at 1 m.");
        var noiseLevel = LevelOption.NotRequired("--noise-level", "dB", "Noise level NL in the receiver band, dB re 1 µPa (with --bandwidth: the spectral level, dB re 1 µPa²/Hz).");
        var threshold = LevelOption.NotRequired("--detection-threshold", "dB", "Signal-to-noise ratio DT the receiver needs.");
        var directivity = LevelOption.WithDefault("--directivity-index", "dB", "Receiver directivity index DI.", 0.0);
        var bandwidth = QuantityOption.NotRequired("--bandwidth", QuantityKind.Frequency, "Receiver bandwidth B: makes --noise-level a spectral level, NL = N + 10·log10(B/1 Hz).");
        var json = PhysicsAction.JsonOption();
        var command = new Command(
            "acoustic",
            "Absorption α (dB/km) and transmission loss TL = k·10·log10(r) + α·r of sound in seawater; with --source-level, --noise-level "
            + "and --detection-threshold also margin_db = SL − TL − (NL − DI) − DT (positive: the link closes).")
        {
            frequency.Option, range.Option, temperature.Option, salinity.Option, depth.Option, formula, ph, spreading,
            sourceLevel.Option, noiseLevel.Option, threshold.Option, directivity.Option, bandwidth.Option, json,
        };
        var map = new ParameterOptions
        {
            { "frequencyHz", frequency }, { "temperatureK", temperature }, { "practicalSalinity", salinity }, { "depthM", depth },
            { "pH", ph }, { "rangeM", range }, { "spreadingExponent", spreading }, { "BandwidthHz", bandwidth },
        };
        command.SetAction(parse => PhysicsAction.Run("acoustic", parse, json, p =>
        {
            var f = frequency.Value(p);
            var t = temperature.Value(p);
            var s = salinity.PracticalSalinity(p);
            var z = depth.Value(p);
            var r = range.Value(p);
            var chosen = p.GetValue(formula);
            var alpha = chosen switch
            {
                AbsorptionFormula.FrancoisGarrison => SeawaterAbsorption.FrancoisGarrisonDbPerKm(f, t, s, z, p.GetValue(ph)),
                AbsorptionFormula.Thorp => SeawaterAbsorption.ThorpDbPerKm(f),
                _ => SeawaterAbsorption.AinslieMcColmDbPerKm(f, t, s, z, p.GetValue(ph)),
            };
            var k = p.GetValue(spreading);
            var report = new PhysicsReport("acoustic path")
                .Number("absorption_db_per_km", $"absorption ({chosen})", alpha, "dB/km")
                .Number("transmission_loss_db", "transmission loss", TransmissionLoss.PowerLawDb(r, k, alpha), "dB")
                .Number("spreading_exponent", "spreading exponent", k, "")
                .Text("absorption_formula", "absorption formula", chosen.ToString());

            var levels = (sourceLevel.Optional(p), noiseLevel.Optional(p), threshold.Optional(p));
            if (levels is not (null, null, null))
            {
                if (levels is not ({ } sl, { } nl, { } dt))
                {
                    throw new UsageException("a margin needs all of --source-level, --noise-level and --detection-threshold.");
                }

                var band = bandwidth.Optional(p) ?? 1.0;
                var link = new AcousticLink(sl, alpha, k, 0.0, band, nl, double.NegativeInfinity, directivity.Value(p), dt);
                var budget = SonarEquation.Evaluate(link, r);
                report.Number("noise_level_db", "noise level in band", budget.NoiseLevelDb, "dB re 1 µPa")
                    .Number("signal_to_noise_db", "signal to noise", budget.SignalToNoiseDb, "dB")
                    .Number("margin_db", "margin over detection threshold", budget.MarginDb, "dB")
                    .Flag("link_up", "link closes", budget.LinkUp);
            }

            return report;
        }, map));
        return command;
    }
}
