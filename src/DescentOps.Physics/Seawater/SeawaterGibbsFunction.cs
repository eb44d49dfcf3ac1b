namespace DescentOps.Physics.Seawater;

/// <summary>
/// The Gibbs function of seawater of TEOS-10 (IOC, SCOR and IAPSO 2010, The international thermodynamic equation of
/// seawater – 2010): the pure-water part of IAPWS-09 (the release's polynomial for liquid water in the oceanographic
/// range) plus the saline part of IAPWS-08 (Feistel 2008), g(S_A, t, p) = g_W(t, p) + g_S(S_A, t, p). Variables are
/// Absolute Salinity in g/kg, ITS-90 temperature and sea pressure (absolute pressure less 101325 Pa). Coefficients are
/// the published ones, rearranged as one table per part; derivatives are taken term by term.
/// </summary>
public static class SeawaterGibbsFunction
{
    /// <summary>Celsius zero, K.</summary>
    public const double CelsiusZeroK = 273.15;

    /// <summary>One standard atmosphere, Pa: absolute pressure = sea pressure + this.</summary>
    public const double StandardAtmospherePa = 101325.0;

    /// <summary>x² = S_A / (40 · 35.16504/35 g/kg): the salinity scale of the saline part (TEOS-10 "sfac").</summary>
    public const double SalinityScalePerGPerKg = 0.0248826675584615;

    private const double TemperatureScalePerK = 0.025;
    private const double PressureScalePerPa = 1e-8;

    // x² ln x coefficients of the saline part (the ideal-solution term), J/kg, for y⁰ and y¹.
    private const double LogConstant = 5812.81456626732;
    private const double LogSlope = 851.226734946706;

    // (power of y, power of z, coefficient), J/kg: the pure-water part g_W(t, p).
    private static readonly (int Y, int Z, double C)[] Water =
    [
        (0, 0, 101.342743139674),
        (0, 1, 100015.695367145),
        (0, 2, -2544.5765420363),
        (0, 3, 284.517778446287),
        (0, 4, -33.3146754253611),
        (0, 5, 4.20263108803084),
        (0, 6, -0.546428511471039),
        (1, 0, 5.90578347909402),
        (1, 1, -270.983805184062),
        (1, 2, 776.153611613101),
        (1, 3, -196.51255088122),
        (1, 4, 28.9796526294175),
        (1, 5, -2.13290083518327),
        (2, 0, -12357.785933039),
        (2, 1, 1455.0364540468),
        (2, 2, -756.558385769359),
        (2, 3, 273.479662323528),
        (2, 4, -55.5604063817218),
        (2, 5, 4.34420671917197),
        (3, 0, 736.741204151612),
        (3, 1, -672.50778314507),
        (3, 2, 499.360390819152),
        (3, 3, -239.545330654412),
        (3, 4, 48.8012518593872),
        (3, 5, -1.66307106208905),
        (4, 0, -148.185936433658),
        (4, 1, 397.968445406972),
        (4, 2, -301.815380621876),
        (4, 3, 152.196371733841),
        (4, 4, -26.3748377232802),
        (5, 0, 58.0259125842571),
        (5, 1, -194.618310617595),
        (5, 2, 120.520654902025),
        (5, 3, -55.2723052340152),
        (5, 4, 6.48190668077221),
        (6, 0, -18.9843846514172),
        (6, 1, 63.5113936641785),
        (6, 2, -22.2897317140459),
        (6, 3, 8.17060541818112),
        (7, 0, 3.05081646487967),
        (7, 1, -9.63108119393062),
    ];

    // (power of x, power of y, power of z, coefficient), J/kg: the saline part without its x² ln x term.
    private static readonly (int X, int Y, int Z, double C)[] Saline =
    [
        (2, 0, 0, 1416.27648484197),
        (2, 0, 1, -3310.49154044839),
        (2, 0, 2, 384.794152978599),
        (2, 0, 3, -96.5324320107458),
        (2, 0, 4, 15.8408172766824),
        (2, 0, 5, -2.62480156590992),
        (2, 1, 0, 168.072408311545),
        (2, 1, 1, 729.116529735046),
        (2, 1, 2, -343.956902961561),
        (2, 1, 3, 124.687671116248),
        (2, 1, 4, -31.656964386073),
        (2, 1, 5, 7.04658803315449),
        (2, 2, 0, 880.031352997204),
        (2, 2, 1, -860.764303783977),
        (2, 2, 2, 337.409530269367),
        (2, 2, 3, -178.314556207638),
        (2, 2, 4, 44.2040358308),
        (2, 2, 5, -7.92001547211682),
        (2, 3, 0, -225.267649263401),
        (2, 3, 1, 694.244814133268),
        (2, 3, 2, -204.889641964903),
        (2, 3, 3, 113.561697840594),
        (2, 3, 4, -11.1282734326413),
        (2, 4, 0, 91.4260447751259),
        (2, 4, 1, -297.728741987187),
        (2, 4, 2, 74.726141138756),
        (2, 4, 3, -36.4872919001588),
        (2, 5, 0, -21.6603240875311),
        (2, 6, 0, 2.13016970847183),
        (3, 0, 0, -2432.14662381794),
        (3, 0, 1, 199.459603073901),
        (3, 0, 2, -52.2940909281335),
        (3, 0, 3, 68.0444942726459),
        (3, 0, 4, -3.41251932441282),
        (3, 1, 0, -493.407510141682),
        (3, 1, 1, -175.292041186547),
        (3, 1, 2, 83.1923927801819),
        (3, 1, 3, -29.483064349429),
        (3, 2, 0, -43.0664675978042),
        (3, 2, 1, 383.058066002476),
        (3, 2, 2, -54.1917262517112),
        (3, 2, 3, 25.6398487389914),
        (3, 3, 0, -10.0227370861875),
        (3, 3, 1, -460.319931801257),
        (3, 4, 0, 0.875600661808945),
        (3, 4, 1, 234.565187611355),
        (4, 0, 0, 2025.80115603697),
        (4, 0, 1, -54.7919133532887),
        (4, 0, 2, -4.08193978912261),
        (4, 0, 3, -30.1755111971161),
        (4, 1, 0, 543.835333000098),
        (4, 1, 1, -22.6683558512829),
        (4, 2, 0, -68.5572509204491),
        (4, 3, 0, 49.3667694856254),
        (4, 4, 0, -17.1397577419788),
        (4, 5, 0, 2.49697009569508),
        (5, 0, 0, -1091.66841042967),
        (5, 0, 1, 36.0284195611086),
        (5, 1, 0, -196.028306689776),
        (6, 0, 0, 374.60123787784),
        (6, 1, 0, 36.7571622995805),
        (7, 0, 0, -48.5891069025409),
    ];

    /// <summary>g and its first and second derivatives at one state; no range check (see <see cref="Teos10Seawater"/>).</summary>
    public static SeawaterGibbsDerivatives Evaluate(double absoluteSalinityGPerKg, double temperatureK, double seaPressurePa)
    {
        var y = (temperatureK - CelsiusZeroK) * TemperatureScalePerK;
        var z = seaPressurePa * 1e-8;
        Span<double> yp = stackalloc double[9];
        Span<double> zp = stackalloc double[8];
        Powers(y, yp);
        Powers(z, zp);

        double g = 0, gy = 0, gz = 0, gyy = 0, gyz = 0, gzz = 0;
        foreach (var (j, k, c) in Water)
        {
            Add(c, 1.0, j, k, yp, zp, ref g, ref gy, ref gz, ref gyy, ref gyz, ref gzz);
        }

        double gs = 0, gsy = 0;
        if (absoluteSalinityGPerKg > 0)
        {
            var x2 = SalinityScalePerGPerKg * absoluteSalinityGPerKg;
            var x = Math.Sqrt(x2);
            Span<double> xp = stackalloc double[8];
            Powers(x, xp);
            foreach (var (i, j, k, c) in Saline)
            {
                Add(c, xp[i], j, k, yp, zp, ref g, ref gy, ref gz, ref gyy, ref gyz, ref gzz);
                // d/dS_A of x^i = (i/2)·sfac·x^(i−2); every saline term has i ≥ 2.
                var ds = c * 0.5 * i * SalinityScalePerGPerKg * xp[i - 2] * zp[k];
                gs += ds * yp[j];
                if (j > 0) gsy += ds * j * yp[j - 1];
            }

            var lnX = Math.Log(x);
            g += x2 * lnX * (LogConstant + (LogSlope * y));
            gy += x2 * lnX * LogSlope;
            gs += SalinityScalePerGPerKg * (lnX + 0.5) * (LogConstant + (LogSlope * y));
            gsy += SalinityScalePerGPerKg * (lnX + 0.5) * LogSlope;
        }

        return new SeawaterGibbsDerivatives(
            absoluteSalinityGPerKg, temperatureK, seaPressurePa,
            g,
            gs,
            gy * TemperatureScalePerK,
            gz * PressureScalePerPa,
            gyy * TemperatureScalePerK * TemperatureScalePerK,
            gyz * TemperatureScalePerK * PressureScalePerPa,
            gzz * PressureScalePerPa * PressureScalePerPa,
            gsy * TemperatureScalePerK);
    }

    private static void Add(double c, double xFactor, int j, int k, ReadOnlySpan<double> yp, ReadOnlySpan<double> zp,
        ref double g, ref double gy, ref double gz, ref double gyy, ref double gyz, ref double gzz)
    {
        var a = c * xFactor;
        g += a * yp[j] * zp[k];
        if (j > 0) gy += a * j * yp[j - 1] * zp[k];
        if (k > 0) gz += a * k * yp[j] * zp[k - 1];
        if (j > 1) gyy += a * j * (j - 1) * yp[j - 2] * zp[k];
        if (j > 0 && k > 0) gyz += a * j * k * yp[j - 1] * zp[k - 1];
        if (k > 1) gzz += a * k * (k - 1) * yp[j] * zp[k - 2];
    }

    private static void Powers(double value, Span<double> powers)
    {
        powers[0] = 1.0;
        for (var n = 1; n < powers.Length; n++) powers[n] = powers[n - 1] * value;
    }
}
