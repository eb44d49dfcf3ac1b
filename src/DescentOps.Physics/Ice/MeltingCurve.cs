using MathNet.Numerics.RootFinding;

namespace DescentOps.Physics.Ice;

/// <summary>
/// Melting curve of ice Ih, IAPWS R14-08(2011) (Wagner et al. 2011, J. Phys. Chem. Ref. Data 40, 043103, eq. for ice Ih),
/// valid from the Ih–III–liquid triple point (251.165 K, 208.566 MPa) to the triple point (273.16 K, 611.657 Pa).
/// </summary>
public static class MeltingCurve
{
    private const string Model = "the IAPWS R14-08 ice Ih melting curve";
    private static readonly double[] A = [0.119539337e7, 0.808183159e5, 0.333826860e4];
    private static readonly double[] B = [0.300000e1, 0.257500e2, 0.103750e3];

    /// <summary>
    /// Highest pressure of the Ih branch: the correlation's own value at 251.165 K (208.5666 MPa, a little above the
    /// rounded 208.566 MPa of the Ih–III–liquid triple point), so that every point of the curve can be inverted.
    /// </summary>
    public static double MaximumPressurePa { get; } = Unchecked(TriplePoint.IhIiiLiquidTemperatureK);

    /// <summary>Melting pressure at a temperature on the Ih branch.</summary>
    public static double PressurePa(double temperatureK)
    {
        ValidRange.Require(temperatureK, TriplePoint.IhIiiLiquidTemperatureK, TriplePoint.TemperatureK, nameof(temperatureK), "K", Model);
        return Unchecked(temperatureK);
    }

    /// <summary>dp_m/dT from the analytic derivative of the correlation (negative: ice Ih melts more easily under pressure).</summary>
    public static double SlopePaPerK(double temperatureK)
    {
        ValidRange.Require(temperatureK, TriplePoint.IhIiiLiquidTemperatureK, TriplePoint.TemperatureK, nameof(temperatureK), "K", Model);
        var theta = temperatureK / TriplePoint.TemperatureK;
        var sum = 0.0;
        for (var i = 0; i < A.Length; i++)
        {
            sum -= A[i] * B[i] * Math.Pow(theta, B[i] - 1.0);
        }

        return TriplePoint.PressurePa * sum / TriplePoint.TemperatureK;
    }

    /// <summary>
    /// Melting temperature at a pressure, by Brent's method on the monotone correlation (the release gives p(T) only).
    /// Below the triple-point pressure there is no liquid (ice sublimates), so that is outside the range.
    /// </summary>
    public static double TemperatureK(double pressurePa)
    {
        ValidRange.Require(pressurePa, TriplePoint.PressurePa, MaximumPressurePa, nameof(pressurePa), "Pa", Model);
        if (pressurePa == TriplePoint.PressurePa) return TriplePoint.TemperatureK;
        return Brent.FindRoot(t => Unchecked(t) - pressurePa, TriplePoint.IhIiiLiquidTemperatureK, TriplePoint.TemperatureK, 1e-11, 200);
    }

    /// <summary>The correlation without the range check, for callers that have already checked.</summary>
    internal static double Unchecked(double temperatureK)
    {
        var theta = temperatureK / TriplePoint.TemperatureK;
        var sum = 1.0;
        for (var i = 0; i < A.Length; i++)
        {
            sum += A[i] * (1.0 - Math.Pow(theta, B[i]));
        }

        return TriplePoint.PressurePa * sum;
    }
}
