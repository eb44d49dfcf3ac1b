namespace DescentOps.Physics.Ocean;

/// <summary>
/// Speed of sound in seawater. Salinity is practical salinity (PSS-78); temperature ITS-90 in kelvin.
/// Two formulas: Chen and Millero (1977) in the UNESCO 1983 form, which takes pressure and so works under any ice
/// load on any body, and Mackenzie (1981), which takes Earth depth and is only for Earth-like overburden.
/// </summary>
public static class SoundSpeed
{
    private const string Unesco = "the UNESCO 1983 (Chen-Millero) sound speed";
    private const string Mackenzie = "the Mackenzie (1981) sound speed";
    private const double PascalPerBar = 1e5;

    /// <summary>
    /// Chen-Millero sound speed (Fofonoff and Millard 1983, UNESCO Tech. Pap. Mar. Sci. 44, eqs. 33–37).
    /// The fit's data start at 0 °C; the range is opened to −2 °C because under-ice water sits at its freezing point,
    /// and the golden-table test bounds the error there against TEOS-10.
    /// </summary>
    public static double UnescoMPerS(double practicalSalinity, double temperatureK, double seaPressurePa)
    {
        ValidRange.Require(practicalSalinity, 0.0, 40.0, nameof(practicalSalinity), "(practical salinity)", Unesco);
        ValidRange.Require(temperatureK, Ipts68.CelsiusZeroK - 2.0, Ipts68.CelsiusZeroK + 40.0, nameof(temperatureK), "K", Unesco);
        ValidRange.Require(seaPressurePa, 0.0, 100e6, nameof(seaPressurePa), "Pa", Unesco);

        var t = Ipts68.CelsiusFromIts90K(temperatureK);
        var s = practicalSalinity;
        var p = seaPressurePa / PascalPerBar;

        var cw0 = 1402.388 + (t * (5.03711 + (t * (-5.80852e-2 + (t * (3.3420e-4 + (t * (-1.47800e-6 + (t * 3.1464e-9)))))))));
        var cw1 = 0.153563 + (t * (6.8982e-4 + (t * (-8.1788e-6 + (t * (1.3621e-7 - (t * 6.1185e-10)))))));
        var cw2 = 3.1260e-5 + (t * (-1.7107e-6 + (t * (2.5974e-8 + (t * (-2.5335e-10 + (t * 1.0405e-12)))))));
        var cw3 = -9.7729e-9 + (t * (3.8504e-10 - (t * 2.3643e-12)));
        var cw = cw0 + (p * (cw1 + (p * (cw2 + (p * cw3)))));

        var a0 = 1.389 + (t * (-1.262e-2 + (t * (7.164e-5 + (t * (2.006e-6 - (t * 3.21e-8)))))));
        var a1 = 9.4742e-5 + (t * (-1.2580e-5 + (t * (-6.4885e-8 + (t * (1.0507e-8 - (t * 2.0122e-10)))))));
        var a2 = -3.9064e-7 + (t * (9.1041e-9 + (t * (-1.6002e-10 + (t * 7.988e-12)))));
        var a3 = 1.100e-10 + (t * (6.649e-12 - (t * 3.389e-13)));
        var a = a0 + (p * (a1 + (p * (a2 + (p * a3)))));

        var b = -1.922e-2 - (4.42e-5 * t) + ((7.3637e-5 + (1.7945e-7 * t)) * p);
        var d = 1.727e-3 - (7.9836e-6 * p);

        return cw + (a * s) + (b * s * Math.Sqrt(s)) + (d * s * s);
    }

    /// <summary>
    /// Mackenzie (1981), "Nine-term equation for sound speed in the oceans", J. Acoust. Soc. Am. 70(3). Depth is depth
    /// in an Earth ocean; on another body convert pressure to an Earth-equivalent depth or use <see cref="UnescoMPerS"/>.
    /// </summary>
    public static double MackenzieMPerS(double practicalSalinity, double temperatureK, double earthDepthM)
    {
        ValidRange.Require(practicalSalinity, 30.0, 40.0, nameof(practicalSalinity), "(practical salinity)", Mackenzie);
        ValidRange.Require(temperatureK, Ipts68.CelsiusZeroK - 2.0, Ipts68.CelsiusZeroK + 30.0, nameof(temperatureK), "K", Mackenzie);
        ValidRange.Require(earthDepthM, 0.0, 8000.0, nameof(earthDepthM), "m", Mackenzie);

        // The paper's temperature is not tied to a scale; the 2.4 mK difference is far inside its 0.07 m/s error.
        var t = temperatureK - Ipts68.CelsiusZeroK;
        var ds = practicalSalinity - 35.0;
        var z = earthDepthM;
        return 1448.96 + (4.591 * t) - (5.304e-2 * t * t) + (2.374e-4 * t * t * t) + (1.340 * ds) + (1.630e-2 * z)
            + (1.675e-7 * z * z) - (1.025e-2 * t * ds) - (7.139e-13 * t * z * z * z);
    }
}
