using MathNet.Numerics;

namespace DescentOps.Physics.Radiation;

/// <summary>
/// Part-to-part spread of the total dose at which electronics fail, as a Weibull or a lognormal distribution. Each unit's
/// failure dose is drawn once from a seeded stream at the start (<see cref="WeibullFailureDoseGy"/>,
/// <see cref="LognormalFailureDoseGy"/>), so a run replays exactly.
/// </summary>
public static class DoseToFailure
{
    private const string Model = "the dose-to-failure distribution";

    /// <summary>Weibull F(D) = 1 − exp[−(D/η)^β].</summary>
    public static double WeibullFailureProbability(double doseGy, double characteristicDoseGy, double shape)
    {
        ValidRange.RequireNonNegative(doseGy, nameof(doseGy), "Gy", Model);
        ValidRange.RequirePositive(characteristicDoseGy, nameof(characteristicDoseGy), "Gy", Model);
        ValidRange.Require(shape, 0.1, 50.0, nameof(shape), "(Weibull shape)", Model);
        return 1.0 - Math.Exp(-Math.Pow(doseGy / characteristicDoseGy, shape));
    }

    /// <summary>Lognormal F(D) = Φ(ln(D/D50)/σ).</summary>
    public static double LognormalFailureProbability(double doseGy, double medianDoseGy, double logStandardDeviation)
    {
        ValidRange.RequireNonNegative(doseGy, nameof(doseGy), "Gy", Model);
        ValidRange.RequirePositive(medianDoseGy, nameof(medianDoseGy), "Gy", Model);
        ValidRange.Require(logStandardDeviation, 1e-3, 5.0, nameof(logStandardDeviation), "(log standard deviation)", Model);
        if (doseGy == 0.0) return 0.0;
        return 0.5 * SpecialFunctions.Erfc(-Math.Log(doseGy / medianDoseGy) / (logStandardDeviation * Math.Sqrt(2.0)));
    }

    /// <summary>Weibull failure dose from a uniform draw u in (0, 1): η·(−ln u)^(1/β).</summary>
    public static double WeibullFailureDoseGy(double uniformDraw, double characteristicDoseGy, double shape)
    {
        ValidRange.Require(uniformDraw, double.Epsilon, 1.0, nameof(uniformDraw), "(uniform draw)", Model);
        ValidRange.RequirePositive(characteristicDoseGy, nameof(characteristicDoseGy), "Gy", Model);
        ValidRange.Require(shape, 0.1, 50.0, nameof(shape), "(Weibull shape)", Model);
        return characteristicDoseGy * Math.Pow(-Math.Log(uniformDraw), 1.0 / shape);
    }

    /// <summary>Lognormal failure dose from a standard normal draw z: D50·exp(σ·z).</summary>
    public static double LognormalFailureDoseGy(double standardNormalDraw, double medianDoseGy, double logStandardDeviation)
    {
        ValidRange.Require(standardNormalDraw, -40.0, 40.0, nameof(standardNormalDraw), "(standard normal draw)", Model);
        ValidRange.RequirePositive(medianDoseGy, nameof(medianDoseGy), "Gy", Model);
        ValidRange.Require(logStandardDeviation, 1e-3, 5.0, nameof(logStandardDeviation), "(log standard deviation)", Model);
        return medianDoseGy * Math.Exp(logStandardDeviation * standardNormalDraw);
    }

    /// <summary>Median Weibull failure dose, η·(ln 2)^(1/β).</summary>
    public static double WeibullMedianDoseGy(double characteristicDoseGy, double shape) => WeibullFailureDoseGy(0.5, characteristicDoseGy, shape);

    /// <summary>Median life at a steady dose rate: the median failure dose over the rate.</summary>
    public static double MedianLifeS(double medianDoseGy, double doseRateGyPerS)
    {
        ValidRange.RequirePositive(medianDoseGy, nameof(medianDoseGy), "Gy", Model);
        ValidRange.RequirePositive(doseRateGyPerS, nameof(doseRateGyPerS), "Gy/s", Model);
        return medianDoseGy / doseRateGyPerS;
    }
}
