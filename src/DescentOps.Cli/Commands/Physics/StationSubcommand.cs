using System.CommandLine;
using DescentOps.Physics.Radiation;
using DescentOps.Scenarios.Format;

namespace DescentOps.Cli.Commands.Physics;

/// <summary><c>physics station --dose-rate R</c>: median life of the surface station's electronics under a steady dose rate.</summary>
internal static class StationSubcommand
{
    /// <summary>Median failure dose of the default part, 300 Gy (30 krad) (RULE: a radiation-tolerant commercial part).</summary>
    public const double DefaultMedianDoseGy = 300.0;

    /// <summary>Lognormal spread of the default part (RULE).</summary>
    public const double DefaultLogStandardDeviation = 0.3;

    /// <summary>Weibull shape of the default part (RULE).</summary>
    public const double DefaultWeibullShape = 4.0;

    public static Command Create()
    {
        var rate = new DoseRateOption("--dose-rate", "Steady absorbed dose rate at the electronics (behind their shielding).");
        var model = new Option<FailureModel>("--failure-model") { Description = "Lognormal (default) or Weibull distribution of the failure dose.", DefaultValueFactory = _ => FailureModel.Lognormal };
        var median = QuantityOption.WithDefault("--median-dose", QuantityKind.AbsorbedDose, "Lognormal: median failure dose D50.", DefaultMedianDoseGy, "300 Gy (30 krad)");
        var sigma = new Option<double>("--log-sd") { Description = "Lognormal: standard deviation σ of ln D, 0.001 to 5. Default: 0.3.", DefaultValueFactory = _ => DefaultLogStandardDeviation };
        var characteristic = QuantityOption.WithDefault("--characteristic-dose", QuantityKind.AbsorbedDose, "Weibull: characteristic dose η (63.2 % failed).", DefaultMedianDoseGy, "300 Gy (30 krad)");
        var shape = new Option<double>("--shape") { Description = "Weibull: shape β, 0.1 to 50. Default: 4.", DefaultValueFactory = _ => DefaultWeibullShape };
        var json = PhysicsAction.JsonOption();
        var command = new Command(
            "station",
            "Median life of the station's electronics at a steady dose rate: median_life_s = median failure dose / dose rate, the median being "
            + "D50 for the lognormal model and η·(ln 2)^(1/β) for the Weibull model.")
        {
            rate.Option, model, median.Option, sigma, characteristic.Option, shape, json,
        };
        var map = new ParameterOptions
        {
            { "doseRateGyPerS", rate }, { "medianDoseGy", median }, { "logStandardDeviation", sigma },
            { "characteristicDoseGy", characteristic }, { "shape", shape },
        };
        command.SetAction(parse => PhysicsAction.Run("station", parse, json, p =>
        {
            var gyPerS = rate.Value(p);
            var chosen = p.GetValue(model);
            double medianGy;
            if (chosen == FailureModel.Weibull)
            {
                medianGy = DoseToFailure.WeibullMedianDoseGy(characteristic.Value(p), p.GetValue(shape));
            }
            else
            {
                medianGy = median.Value(p);
                // Checks σ against the model's range even though the median does not depend on it.
                DoseToFailure.LognormalFailureProbability(medianGy, medianGy, p.GetValue(sigma));
            }

            return new PhysicsReport("station electronics")
                .Number("dose_rate_gy_s", "dose rate", gyPerS, "Gy/s")
                .Number("median_dose_gy", "median failure dose", medianGy, "Gy")
                .Number("median_life_s", "median life", DoseToFailure.MedianLifeS(medianGy, gyPerS), "s")
                .Text("failure_model", "failure model", chosen.ToString());
        }, map));
        return command;
    }
}
