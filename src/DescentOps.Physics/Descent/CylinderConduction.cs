using MathNet.Numerics;

namespace DescentOps.Physics.Descent;

/// <summary>
/// Transient radial conduction from a long cylinder of radius R suddenly held at a fixed temperature in an infinite
/// medium (Carslaw and Jaeger 1959, Conduction of Heat in Solids, §13.5). With τ = κt/R², the wall flux is
/// q = (Φ/R) G(τ) and the heat drawn per unit length up to τ is (Φ R/κ) H(τ), where
/// G(τ) = (4/π²) ∫₀^∞ e^(−τu²) du / (u [J0²(u) + Y0²(u)]) and H(τ) = ∫₀^τ G.
/// </summary>
/// <remarks>
/// Numerics (ours): u = eˣ, composite 5-point Gauss–Legendre on x ∈ [−20, 36] in panels of 0.05, with J0² + Y0² from
/// MathNet's Bessel functions (its large-argument expansion 2/(πu)·(1 − 1/(8u²) + 27/(128u⁴)) above u = 25); the part
/// below x = −20 is closed-form from the small-argument Y0 ≈ (2/π)(ln(u/2) + γ). The nodes do not depend on τ and are
/// computed once. For τ &lt; 1e-4 the short-time series are used (error far below 1e-8 relative there). Above τ = 1e12 the
/// lower tail is no longer closed-form and the functions refuse to extrapolate.
/// </remarks>
public static class CylinderConduction
{
    public const double MaximumTau = 1e12;
    private const double SeriesBelowTau = 1e-4;
    private const double LowerX = -20.0;
    private const double UpperX = 36.0;
    private const double Panel = 0.05;

    private static readonly double[] GaussNodes = [-0.9061798459386640, -0.5384693101056831, 0.0, 0.5384693101056831, 0.9061798459386640];
    private static readonly double[] GaussWeights = [0.2369268850561891, 0.4786286704993665, 0.5688888888888889, 0.4786286704993665, 0.2369268850561891];

    private static readonly Lazy<(double[] U2, double[] Weight)> Nodes = new(BuildNodes);

    /// <summary>Closed-form part of ∫ (4/π²)/(J0²+Y0²) dx for x below <see cref="LowerX"/>.</summary>
    private static readonly double LowerTail = LowerTailIntegral();

    /// <summary>Dimensionless wall flux G(τ).</summary>
    public static double G(double tau)
    {
        ValidRange.Require(tau, double.Epsilon, MaximumTau, nameof(tau), "", "the cylinder conduction function G");
        if (tau < SeriesBelowTau) return (1.0 / Math.Sqrt(Math.PI * tau)) + 0.5 - (0.25 * Math.Sqrt(tau / Math.PI)) + (tau / 8.0);
        var (u2, w) = Nodes.Value;
        var sum = LowerTail;
        for (var i = 0; i < u2.Length; i++)
        {
            var y = tau * u2[i];
            if (y > 745) continue;
            sum += w[i] * Math.Exp(-y);
        }

        return sum;
    }

    /// <summary>Dimensionless cumulative heat H(τ) = ∫₀^τ G(s) ds.</summary>
    public static double H(double tau)
    {
        ValidRange.Require(tau, 0.0, MaximumTau, nameof(tau), "", "the cylinder conduction function H");
        if (tau == 0) return 0.0;
        if (tau < SeriesBelowTau) return (2.0 * Math.Sqrt(tau / Math.PI)) + (tau / 2.0) - (Math.Pow(tau, 1.5) / (6.0 * Math.Sqrt(Math.PI))) + (tau * tau / 16.0);
        var (u2, w) = Nodes.Value;
        var sum = tau * LowerTail;
        for (var i = 0; i < u2.Length; i++)
        {
            sum += w[i] * OneMinusExpNeg(tau * u2[i]) / u2[i];
        }

        return sum;
    }

    /// <summary>1 − e^(−y) without cancellation for small y (.NET has no expm1).</summary>
    private static double OneMinusExpNeg(double y) =>
        y < 1e-5 ? y * (1.0 - (y * (0.5 - (y / 6.0)))) : 1.0 - Math.Exp(-y);

    private static (double[] U2, double[] Weight) BuildNodes()
    {
        var panels = (int)Math.Round((UpperX - LowerX) / Panel);
        var n = panels * GaussNodes.Length;
        var u2 = new double[n];
        var weight = new double[n];
        var k = 0;
        for (var p = 0; p < panels; p++)
        {
            var mid = LowerX + ((p + 0.5) * Panel);
            for (var j = 0; j < GaussNodes.Length; j++)
            {
                var x = mid + (0.5 * Panel * GaussNodes[j]);
                var u = Math.Exp(x);
                u2[k] = u * u;
                weight[k] = 0.5 * Panel * GaussWeights[j] * (4.0 / (Math.PI * Math.PI)) / BesselModulusSquared(u);
                k++;
            }
        }

        return (u2, weight);
    }

    /// <summary>J0(u)² + Y0(u)².</summary>
    private static double BesselModulusSquared(double u)
    {
        if (u > 25.0)
        {
            var inv2 = 1.0 / (u * u);
            return 2.0 / (Math.PI * u) * (1.0 - (inv2 / 8.0) + (27.0 / 128.0 * inv2 * inv2));
        }

        var j0 = SpecialFunctions.BesselJ(0, u);
        var y0 = SpecialFunctions.BesselY(0, u);
        return (j0 * j0) + (y0 * y0);
    }

    private static double LowerTailIntegral()
    {
        // For u → 0, J0 → 1 and Y0 → (2/π)(x − ln 2 + γ); (4/π²)/(1 + c²(x − b)²) integrates to an arctangent.
        const double c = 2.0 / Math.PI;
        var b = Math.Log(2.0) - Constants.EulerMascheroni;
        return 4.0 / (Math.PI * Math.PI) / c * (Math.Atan(c * (LowerX - b)) + (Math.PI / 2.0));
    }
}
