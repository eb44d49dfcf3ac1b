using System.Numerics;

namespace DescentOps.Physics.Ice;

/// <summary>
/// IAPWS R10-06(2009), the Gibbs function of ice Ih (Feistel and Wagner 2006, J. Phys. Chem. Ref. Data 35, 1021),
/// with the entropy constant of the IAPWS-95 reference state so that ice and liquid enthalpies can be subtracted
/// to give latent heats. Derivatives are analytic, in complex arithmetic, as the release prescribes.
/// </summary>
public static class IceGibbsFunction
{
    /// <summary>Upper pressure of the release's validity (R10-06: up to 210 MPa in the Ih stability field).</summary>
    public const double MaximumPressurePa = 210e6;

    /// <summary>
    /// Temperature margin allowed above the melting curve: the release's own normal-melting state (273.152519 K,
    /// 101325 Pa) lies on R14-08's curve only to about 1e-5 K, and a state on the curve must stay usable.
    /// </summary>
    private const double MeltingMarginK = 1e-4;

    private const string Model = "IAPWS R10-06 (ice Ih Gibbs function)";

    private const double Tt = TriplePoint.TemperatureK;
    private const double Pt = TriplePoint.PressurePa;
    private const double Pi0 = TriplePoint.NormalPressurePa / TriplePoint.PressurePa;

    private static readonly double[] G0 =
    [
        -0.632020233335886e6, 0.655022213658955, -0.189369929326131e-7, 0.339746123271053e-14, -0.556464869058991e-21,
    ];

    private const double S0 = -0.332733756492168e4;
    private static readonly Complex T1 = new(0.368017112855051e-1, 0.510878114959572e-1);
    private static readonly Complex R1 = new(0.447050716285388e2, 0.656876847463481e2);
    private static readonly Complex T2 = new(0.337315741065416, 0.335449415919309);
    private static readonly Complex R20 = new(-0.725974574329220e2, -0.781008427112870e2);
    private static readonly Complex R21 = new(-0.557107698030123e-4, 0.464578634580806e-4);
    private static readonly Complex R22 = new(0.234801409215913e-10, -0.285651142904972e-10);

    /// <summary>
    /// Evaluates g and its derivatives. Valid for 0 ≤ T ≤ 273.16 K and 0 ≤ p ≤ 210 MPa where ice Ih is stable
    /// against melting (states above the R14-08 melting curve are refused); metastable states below the
    /// sublimation curve are allowed because the release is used there to give the zero-pressure density.
    /// </summary>
    public static IceGibbsDerivatives Evaluate(double temperatureK, double pressurePa)
    {
        ValidRange.Require(temperatureK, 0.0, Tt, nameof(temperatureK), "K", Model);
        ValidRange.Require(pressurePa, 0.0, MaximumPressurePa, nameof(pressurePa), "Pa", Model);
        if (temperatureK > TriplePoint.IhIiiLiquidTemperatureK + MeltingMarginK)
        {
            var meltingPressurePa = MeltingCurve.Unchecked(temperatureK - MeltingMarginK);
            if (pressurePa > meltingPressurePa)
            {
                throw new ArgumentOutOfRangeException(
                    nameof(pressurePa),
                    pressurePa,
                    FormattableString.Invariant(
                        $"pressurePa = {pressurePa:R} Pa is outside the valid range [0, {meltingPressurePa:R}] Pa of {Model} at {temperatureK:R} K: ice Ih has melted (IAPWS R14-08 melting curve)."));
            }
        }

        return EvaluateUnchecked(temperatureK, pressurePa);
    }

    internal static IceGibbsDerivatives EvaluateUnchecked(double temperatureK, double pressurePa)
    {
        var tau = temperatureK / Tt;
        var dPi = (pressurePa / Pt) - Pi0;

        double g0 = 0, g0p = 0, g0pp = 0;
        for (var k = 0; k < G0.Length; k++)
        {
            g0 += G0[k] * Math.Pow(dPi, k);
            if (k >= 1) g0p += G0[k] * k * Math.Pow(dPi, k - 1) / Pt;
            if (k >= 2) g0pp += G0[k] * k * (k - 1) * Math.Pow(dPi, k - 2) / (Pt * Pt);
        }

        var r2 = R20 + (R21 * dPi) + (R22 * dPi * dPi);
        var r2p = (R21 + (2.0 * R22 * dPi)) / Pt;
        var r2pp = 2.0 * R22 / (Pt * Pt);

        var (b1, b1t, b1tt) = Bracket(T1, tau);
        var (b2, b2t, b2tt) = Bracket(T2, tau);

        var g = g0 - (S0 * Tt * tau) + (Tt * ((R1 * b1) + (r2 * b2)).Real);
        var gt = -S0 + ((R1 * b1t) + (r2 * b2t)).Real;
        var gtt = ((R1 * b1tt) + (r2 * b2tt)).Real / Tt;
        var gp = g0p + (Tt * (r2p * b2).Real);
        var gpp = g0pp + (Tt * (r2pp * b2).Real);
        var gtp = (r2p * b2t).Real;
        return new IceGibbsDerivatives(temperatureK, pressurePa, g, gt, gp, gtt, gtp, gpp);
    }

    /// <summary>The bracket of R10-06 eq. (4) and its first two τ-derivatives, principal-branch logarithms.</summary>
    private static (Complex Value, Complex DTau, Complex DTau2) Bracket(Complex t, double tau)
    {
        var minus = t - tau;
        var plus = t + tau;
        var value = (minus * Complex.Log(minus)) + (plus * Complex.Log(plus)) - (2.0 * t * Complex.Log(t)) - (tau * tau / t);
        var dTau = -Complex.Log(minus) + Complex.Log(plus) - (2.0 * tau / t);
        var dTau2 = (1.0 / minus) + (1.0 / plus) - (2.0 / t);
        return (value, dTau, dTau2);
    }
}
