namespace DescentOps.Physics.Seawater;

/// <summary>
/// Specific volume of seawater as the 75-term polynomial in Absolute Salinity, Conservative Temperature and sea
/// pressure of Roquet, Madec, McDougall and Barker (2015), "Accurate polynomial expressions for the density and
/// specific volume of seawater using the TEOS-10 standard", Ocean Modelling 90, 29–43: the form TEOS-10 recommends
/// for ocean models. Density is its inverse and the sound speed follows from its pressure derivative,
/// c = sqrt(−v² / (∂v/∂p)).
/// </summary>
public static class SpecificVolumePolynomial
{
    /// <summary>The salinity offset of the polynomial's square-root variable, 24 g/kg times the TEOS-10 salinity scale.</summary>
    private const double SalinityOffset = 5.971840214030754e-1;

    // (power of y = Θ/40 °C, power of x = sqrt(sfac·S_A + offset), power of z = p/10⁸ Pa, coefficient), m³/kg.
    private static readonly (int Y, int X, int Z, double C)[] Terms =
    [
        (0, 0, 0, 1.0769995862e-3),
        (0, 0, 1, -6.0799143809e-5),
        (0, 0, 2, 9.9856169219e-6),
        (0, 0, 3, -1.1309361437e-6),
        (0, 0, 4, 1.0531153080e-7),
        (0, 0, 5, -1.2647261286e-8),
        (0, 0, 6, 1.9613503930e-9),
        (0, 1, 0, -3.1038981976e-4),
        (0, 1, 1, 2.4262468747e-5),
        (0, 1, 2, -5.8484432984e-7),
        (0, 1, 3, 3.6310188515e-7),
        (0, 1, 4, -1.1147125423e-7),
        (0, 2, 0, 6.6928067038e-4),
        (0, 2, 1, -3.4792460974e-5),
        (0, 2, 2, -4.8122251597e-6),
        (0, 2, 3, 1.6746303780e-8),
        (0, 3, 0, -8.5047933937e-4),
        (0, 3, 1, 3.7470777305e-5),
        (0, 3, 2, 4.9263106998e-6),
        (0, 4, 0, 5.8086069943e-4),
        (0, 4, 1, -1.7322218612e-5),
        (0, 4, 2, -1.7811974727e-6),
        (0, 5, 0, -2.1092370507e-4),
        (0, 5, 1, 3.0927427253e-6),
        (0, 6, 0, 3.1932457305e-5),
        (1, 0, 0, -1.5649734675e-5),
        (1, 0, 1, 1.8505765429e-5),
        (1, 0, 2, -1.1736386731e-6),
        (1, 0, 3, -3.6527006553e-7),
        (1, 0, 4, 3.1454099902e-7),
        (1, 1, 0, 3.5009599764e-5),
        (1, 1, 1, -9.5677088156e-6),
        (1, 1, 2, -5.5699154557e-6),
        (1, 1, 3, -2.7295696237e-7),
        (1, 2, 0, -4.3592678561e-5),
        (1, 2, 1, 1.1100834765e-5),
        (1, 2, 2, 5.4620748834e-6),
        (1, 3, 0, 3.4532461828e-5),
        (1, 3, 1, -9.8447117844e-6),
        (1, 3, 2, -1.3544185627e-6),
        (1, 4, 0, -1.1959409788e-5),
        (1, 4, 1, 2.5909225260e-6),
        (1, 5, 0, 1.3864594581e-6),
        (2, 0, 0, 2.7762106484e-5),
        (2, 0, 1, -1.1716606853e-5),
        (2, 0, 2, 2.1305028740e-6),
        (2, 0, 3, 2.8695905159e-7),
        (2, 1, 0, -3.7435842344e-5),
        (2, 1, 1, -2.3678308361e-7),
        (2, 1, 2, 3.9137387080e-7),
        (2, 2, 0, 3.5907822760e-5),
        (2, 2, 1, 2.9283346295e-6),
        (2, 2, 2, -6.5731104067e-7),
        (2, 3, 0, -1.8698584187e-5),
        (2, 3, 1, -4.8826139200e-7),
        (2, 4, 0, 3.8595339244e-6),
        (3, 0, 0, -1.6521159259e-5),
        (3, 0, 1, 7.9279656173e-6),
        (3, 0, 2, -4.6132540037e-7),
        (3, 1, 0, 2.4141479483e-5),
        (3, 1, 1, -3.4558773655e-6),
        (3, 1, 2, 7.7618888092e-9),
        (3, 2, 0, -1.4353633048e-5),
        (3, 2, 1, 3.1655306078e-7),
        (3, 3, 0, 2.2863324556e-6),
        (4, 0, 0, 6.9111322702e-6),
        (4, 0, 1, -3.4102187482e-6),
        (4, 0, 2, -6.3352916514e-8),
        (4, 1, 0, -8.7595873154e-6),
        (4, 1, 1, 1.2956717783e-6),
        (4, 2, 0, 4.3703680598e-6),
        (5, 0, 0, -8.0539615540e-7),
        (5, 0, 1, 5.0736766814e-7),
        (5, 1, 0, -3.3052758900e-7),
        (6, 0, 0, 2.0543094268e-7),
    ];

    /// <summary>Specific volume v and ∂v/∂p at a state (no range check; see <see cref="Teos10Seawater"/>).</summary>
    public static (double VolumeM3PerKg, double PressureSlopeM3PerKgPa) Evaluate(double absoluteSalinityGPerKg, double conservativeTemperatureK, double seaPressurePa)
    {
        var x = Math.Sqrt((SeawaterGibbsFunction.SalinityScalePerGPerKg * absoluteSalinityGPerKg) + SalinityOffset);
        var y = (conservativeTemperatureK - SeawaterGibbsFunction.CelsiusZeroK) * 0.025;
        var z = seaPressurePa * 1e-8;
        Span<double> xp = stackalloc double[7];
        Span<double> yp = stackalloc double[7];
        Span<double> zp = stackalloc double[7];
        xp[0] = yp[0] = zp[0] = 1.0;
        for (var n = 1; n < 7; n++)
        {
            xp[n] = xp[n - 1] * x;
            yp[n] = yp[n - 1] * y;
            zp[n] = zp[n - 1] * z;
        }

        double v = 0, vz = 0;
        foreach (var (i, j, k, c) in Terms)
        {
            var a = c * yp[i] * xp[j];
            v += a * zp[k];
            if (k > 0) vz += a * k * zp[k - 1];
        }

        return (v, vz * 1e-8);
    }

    public static double DensityKgPerM3(double absoluteSalinityGPerKg, double conservativeTemperatureK, double seaPressurePa) =>
        1.0 / Evaluate(absoluteSalinityGPerKg, conservativeTemperatureK, seaPressurePa).VolumeM3PerKg;

    public static double SoundSpeedMPerS(double absoluteSalinityGPerKg, double conservativeTemperatureK, double seaPressurePa)
    {
        var (v, vp) = Evaluate(absoluteSalinityGPerKg, conservativeTemperatureK, seaPressurePa);
        return Math.Sqrt(-v * v / vp);
    }
}
