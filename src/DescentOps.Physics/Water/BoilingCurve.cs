namespace DescentOps.Physics.Water;

/// <summary>
/// Boiling (saturation) temperature of water at a pressure: the backward equation T_s(p) of IAPWS-IF97 region 4
/// (IAPWS R7-97(2012), eq. 31), valid from the triple-point pressure to the critical pressure 22.064 MPa. Above the
/// critical pressure water does not boil: the bound is the critical temperature 647.096 K.
/// </summary>
/// <remarks>The melt film under a probe's head cannot be hotter than this at the local pressure (the film would boil).</remarks>
public static class BoilingCurve
{
    /// <summary>Critical pressure of water, IAPWS-IF97.</summary>
    public const double CriticalPressurePa = 22.064e6;

    /// <summary>Critical temperature of water, IAPWS-IF97.</summary>
    public const double CriticalTemperatureK = 647.096;

    /// <summary>Lowest pressure of the region-4 equation, the saturation pressure at 273.15 K (IAPWS-IF97).</summary>
    public const double MinimumPressurePa = 611.213;

    private static readonly double[] N =
    [
        0.11670521452767e4, -0.72421316703206e6, -0.17073846940092e2, 0.12020824702470e5, -0.32325550322333e7,
        0.14915108613530e2, -0.48232657361591e4, 0.40511340542057e6, -0.23855557567849, 0.65017534844798e3,
    ];

    /// <summary>Saturation temperature at a pressure (Pa); the critical temperature above the critical pressure.</summary>
    public static double TemperatureK(double pressurePa)
    {
        ValidRange.Require(pressurePa, MinimumPressurePa, 1e9, nameof(pressurePa), "Pa", "the IAPWS-IF97 boiling curve");
        if (pressurePa >= CriticalPressurePa) return CriticalTemperatureK;
        var beta = Math.Pow(pressurePa / 1e6, 0.25);
        var beta2 = beta * beta;
        var e = beta2 + (N[2] * beta) + N[5];
        var f = (N[0] * beta2) + (N[3] * beta) + N[6];
        var g = (N[1] * beta2) + (N[4] * beta) + N[7];
        var d = 2.0 * g / (-f - Math.Sqrt((f * f) - (4.0 * e * g)));
        var sum = N[9] + d;
        return 0.5 * (sum - Math.Sqrt((sum * sum) - (4.0 * (N[8] + (N[9] * d)))));
    }
}
