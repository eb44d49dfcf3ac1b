using MathNet.Numerics;
using MathNet.Numerics.RootFinding;

namespace DescentOps.Physics.Refreezing;

/// <summary>
/// Similarity solutions of planar freezing (Stefan/Neumann; Carslaw and Jaeger 1959, §11.2): the front moves as
/// s(t) = 2λ√(κ_s t). The front constant λ is the root of a transcendental equation that is monotone in λ, found with
/// Brent's method on a bracket starting at [1e-9, 3] and expanded if needed, to 1e-12. Solid and liquid densities
/// are taken equal, as in the classical solutions.
/// </summary>
public static class StefanProblem
{
    /// <summary>Largest Stefan number accepted; ice cooled from the melting point to 50 K has about 0.9.</summary>
    public const double MaximumStefanNumber = 100.0;

    private const double Tolerance = 1e-12;
    private static readonly double SqrtPi = Math.Sqrt(Math.PI);

    /// <summary>Case (a): liquid at T_m, wall held at T_w: λ√π e^(λ²) erf λ = Ste.</summary>
    public static double OnePhaseFrontConstant(double stefanNumber)
    {
        Check(stefanNumber);
        return Solve(l => (l * SqrtPi * Math.Exp(l * l) * SpecialFunctions.Erf(l)) - stefanNumber);
    }

    /// <summary>
    /// Case (b): liquid at T_m freezing onto semi-infinite ice initially at T∞ (the borehole wall):
    /// λ√π e^(λ²) (1 + erf λ) = Ste, with Ste = c (T_m − T∞)/L.
    /// </summary>
    public static double ColdWallFrontConstant(double stefanNumber)
    {
        Check(stefanNumber);
        return Solve(l => (l * SqrtPi * Math.Exp(l * l) * (1.0 + SpecialFunctions.Erf(l))) - stefanNumber);
    }

    /// <summary>
    /// Case (c), two-phase Neumann: liquid initially at T_l &gt; T_m, wall at T_w:
    /// Ste e^(−λ²)/(√π erf λ) − B e^(−λ²ν²)/(√π erfc(λν)) − λ = 0, ν = √(κ_s/κ_l), B = k_l (T_l − T_m)/(ρ_s L √(κ_s κ_l)).
    /// </summary>
    public static double TwoPhaseFrontConstant(double stefanNumber, double liquidSuperheatNumber, double diffusivityRatioRoot)
    {
        Check(stefanNumber);
        ValidRange.Require(liquidSuperheatNumber, 0.0, MaximumStefanNumber, nameof(liquidSuperheatNumber), "", "the Neumann solution");
        ValidRange.RequirePositive(diffusivityRatioRoot, nameof(diffusivityRatioRoot), "", "the Neumann solution");
        // Written as a decreasing function of λ; multiply through by erf λ to keep it finite at small λ.
        return Solve(l =>
        {
            var erf = SpecialFunctions.Erf(l);
            return (l * erf) + (liquidSuperheatNumber * erf * ExpOverErfc(l * diffusivityRatioRoot) / SqrtPi) - (stefanNumber * Math.Exp(-l * l) / SqrtPi);
        });
    }

    /// <summary>e^(−x²)/erfc(x), with its asymptotic series where erfc underflows.</summary>
    private static double ExpOverErfc(double x)
    {
        if (x < 20.0) return Math.Exp(-x * x) / SpecialFunctions.Erfc(x);
        var inv2 = 1.0 / (x * x);
        return SqrtPi * x / (1.0 - (0.5 * inv2) + (0.75 * inv2 * inv2) - (1.875 * inv2 * inv2 * inv2));
    }

    private static void Check(double stefanNumber) =>
        ValidRange.Require(stefanNumber, double.Epsilon, MaximumStefanNumber, nameof(stefanNumber), "", "the Stefan similarity solution");

    /// <summary>Root of an increasing function on (0, ∞).</summary>
    private static double Solve(Func<double, double> increasing)
    {
        double lower = 1e-9, upper = 3.0;
        while (increasing(upper) < 0) upper *= 1.5;
        if (increasing(lower) > 0)
        {
            lower = 1e-300;
        }

        return Brent.FindRoot(increasing, lower, upper, Tolerance, 500);
    }
}
