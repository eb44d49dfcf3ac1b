namespace DescentOps.Physics.Ice;

/// <summary>
/// Sublimation (vapour) pressure over ice Ih, IAPWS R14-08(2011) (Wagner et al. 2011), valid 50–273.16 K.
/// Preferred over the Murphy–Koop (2005) vapour-pressure fit because its range reaches the cold surface of an icy moon.
/// </summary>
public static class SublimationCurve
{
    /// <summary>Lower end of the correlation's validity.</summary>
    public const double MinimumTemperatureK = 50.0;

    private const string Model = "the IAPWS R14-08 sublimation curve";
    private static readonly double[] A = [-0.212144006e2, 0.273203819e2, -0.610598130e1];
    private static readonly double[] B = [0.333333333e-2, 0.120666667e1, 0.170333333e1];

    /// <summary>Sublimation pressure at a temperature.</summary>
    public static double PressurePa(double temperatureK)
    {
        ValidRange.Require(temperatureK, MinimumTemperatureK, TriplePoint.TemperatureK, nameof(temperatureK), "K", Model);
        var theta = temperatureK / TriplePoint.TemperatureK;
        var sum = 0.0;
        for (var i = 0; i < A.Length; i++)
        {
            sum += A[i] * Math.Pow(theta, B[i]);
        }

        return TriplePoint.PressurePa * Math.Exp(sum / theta);
    }
}
