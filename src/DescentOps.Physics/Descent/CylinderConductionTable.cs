namespace DescentOps.Physics.Descent;

/// <summary>
/// H(τ) of <see cref="CylinderConduction"/> from a table built once: ln H tabulated against ln τ every 0.05 from
/// τ = 1e-4 to 1e12 and interpolated with 4-point Lagrange polynomials (relative error below 1e-7 against the
/// quadrature, checked in the tests). The side balance evaluates H at dozens of wall positions per steady solution;
/// the quadrature costs thousands of exponentials each time, the table a few multiplications.
/// </summary>
public static class CylinderConductionTable
{
    private const double LowerLnTau = -9.210340371976182; // ln 1e-4
    private const double Step = 0.05;

    private static readonly Lazy<double[]> LnH = new(Build);

    /// <summary>H(τ) for 0 ≤ τ ≤ 1e12; the short-time series below τ = 1e-4.</summary>
    public static double H(double tau)
    {
        if (tau < 1e-4) return CylinderConduction.H(tau);
        ValidRange.Require(tau, 0.0, CylinderConduction.MaximumTau, nameof(tau), "", "the cylinder conduction table");
        var table = LnH.Value;
        var x = (Math.Log(tau) - LowerLnTau) / Step;
        var i = Math.Clamp((int)Math.Floor(x) - 1, 0, table.Length - 4);
        var t = x - i;
        // Lagrange weights on nodes 0..3 at t.
        var w0 = -(t - 1) * (t - 2) * (t - 3) / 6.0;
        var w1 = t * (t - 2) * (t - 3) / 2.0;
        var w2 = -t * (t - 1) * (t - 3) / 2.0;
        var w3 = t * (t - 1) * (t - 2) / 6.0;
        return Math.Exp((w0 * table[i]) + (w1 * table[i + 1]) + (w2 * table[i + 2]) + (w3 * table[i + 3]));
    }

    private static double[] Build()
    {
        var count = (int)Math.Ceiling((Math.Log(CylinderConduction.MaximumTau) - LowerLnTau) / Step) + 1;
        var table = new double[count];
        for (var i = 0; i < count; i++)
        {
            table[i] = Math.Log(CylinderConduction.H(Math.Min(Math.Exp(LowerLnTau + (i * Step)), CylinderConduction.MaximumTau)));
        }

        return table;
    }
}
