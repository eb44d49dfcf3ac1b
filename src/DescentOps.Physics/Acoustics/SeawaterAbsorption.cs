namespace DescentOps.Physics.Acoustics;

/// <summary>
/// Absorption of sound in seawater, dB/km, with frequency in Hz, ITS-90 temperature in K, practical salinity and depth
/// in m. The formulas assume standard sea salt; an ocean rich in other salts needs its boric-acid and MgSO4 terms
/// rescaled, which no formula here does.
/// </summary>
public static class SeawaterAbsorption
{
    private const double ZeroCelsiusK = PhysicalConstants.CelsiusZeroK;
    private const string FrancoisGarrison = "the Francois-Garrison (1982) absorption";
    private const string AinslieMcColm = "the Ainslie-McColm (1998) absorption";
    private const string Thorp = "the Thorp (1967) absorption";

    /// <summary>
    /// Francois and Garrison (1982a,b), J. Acoust. Soc. Am. 72(3) 896–907 and 72(6) 1879–1890: boric acid, MgSO4 and
    /// pure-water terms. The range enforced is the one the authors claim 5 % accuracy over.
    /// </summary>
    public static double FrancoisGarrisonDbPerKm(double frequencyHz, double temperatureK, double practicalSalinity, double depthM, double pH)
    {
        ValidRange.Require(frequencyHz, 200.0, 1e6, nameof(frequencyHz), "Hz", FrancoisGarrison);
        ValidRange.Require(temperatureK, ZeroCelsiusK - 2.0, ZeroCelsiusK + 22.0, nameof(temperatureK), "K", FrancoisGarrison);
        ValidRange.Require(practicalSalinity, 30.0, 35.0, nameof(practicalSalinity), "(practical salinity)", FrancoisGarrison);
        ValidRange.Require(depthM, 0.0, 3500.0, nameof(depthM), "m", FrancoisGarrison);
        ValidRange.Require(pH, 7.7, 8.3, nameof(pH), "(pH)", FrancoisGarrison);

        var f = frequencyHz / 1e3;
        var f2 = f * f;
        var t = temperatureK - ZeroCelsiusK;
        var s = practicalSalinity;
        var z = depthM;
        var theta = 273.0 + t;
        var c = 1412.0 + (3.21 * t) + (1.19 * s) + (0.0167 * z);

        var a1 = 8.86 / c * Math.Pow(10.0, (0.78 * pH) - 5.0);
        var f1 = 2.8 * Math.Sqrt(s / 35.0) * Math.Pow(10.0, 4.0 - (1245.0 / theta));

        var a2 = 21.44 * s / c * (1.0 + (0.025 * t));
        var p2 = 1.0 - (1.37e-4 * z) + (6.2e-9 * z * z);
        var f2Relax = 8.17 * Math.Pow(10.0, 8.0 - (1990.0 / theta)) / (1.0 + (0.0018 * (s - 35.0)));

        var p3 = 1.0 - (3.83e-5 * z) + (4.9e-10 * z * z);
        var a3 = t <= 20.0
            ? 4.937e-4 - (2.59e-5 * t) + (9.11e-7 * t * t) - (1.50e-8 * t * t * t)
            : 3.964e-4 - (1.146e-5 * t) + (1.45e-7 * t * t) - (6.5e-10 * t * t * t);

        return (a1 * f1 * f2 / ((f1 * f1) + f2)) + (a2 * p2 * f2Relax * f2 / ((f2Relax * f2Relax) + f2)) + (a3 * p3 * f2);
    }

    /// <summary>
    /// Ainslie and McColm (1998), "A simplified formula for viscous and chemical absorption in sea water", J. Acoust.
    /// Soc. Am. 103(3): within 10 % of Francois-Garrison over a wider salinity range, which suits an ocean whose
    /// salinity is uncertain.
    /// </summary>
    public static double AinslieMcColmDbPerKm(double frequencyHz, double temperatureK, double practicalSalinity, double depthM, double pH)
    {
        ValidRange.Require(frequencyHz, 100.0, 1e6, nameof(frequencyHz), "Hz", AinslieMcColm);
        ValidRange.Require(temperatureK, ZeroCelsiusK - 6.0, ZeroCelsiusK + 35.0, nameof(temperatureK), "K", AinslieMcColm);
        ValidRange.Require(practicalSalinity, 5.0, 50.0, nameof(practicalSalinity), "(practical salinity)", AinslieMcColm);
        ValidRange.Require(depthM, 0.0, 7000.0, nameof(depthM), "m", AinslieMcColm);
        ValidRange.Require(pH, 7.7, 8.3, nameof(pH), "(pH)", AinslieMcColm);

        var f = frequencyHz / 1e3;
        var f2 = f * f;
        var t = temperatureK - ZeroCelsiusK;
        var s = practicalSalinity;
        var zKm = depthM / 1e3;
        var f1 = 0.78 * Math.Sqrt(s / 35.0) * Math.Exp(t / 26.0);
        var fMg = 42.0 * Math.Exp(t / 17.0);
        return (0.106 * f1 * f2 / ((f1 * f1) + f2) * Math.Exp((pH - 8.0) / 0.56))
            + (0.52 * (1.0 + (t / 43.0)) * (s / 35.0) * fMg * f2 / ((fMg * fMg) + f2) * Math.Exp(-zKm / 6.0))
            + (0.00049 * f2 * Math.Exp(-((t / 27.0) + (zKm / 17.0))));
    }

    /// <summary>
    /// Thorp (1967), originally in dB per kiloyard for about 4 °C and 1 km depth; converted here to dB/km. Only a
    /// cross-check: it has no temperature, salinity or depth dependence.
    /// </summary>
    public static double ThorpDbPerKm(double frequencyHz)
    {
        ValidRange.Require(frequencyHz, 100.0, 50e3, nameof(frequencyHz), "Hz", Thorp);
        var f2 = frequencyHz * frequencyHz / 1e6;
        var dbPerKiloyard = (0.1 * f2 / (1.0 + f2)) + (40.0 * f2 / (4100.0 + f2)) + (2.75e-4 * f2) + 0.003;
        return dbPerKiloyard / 0.9144;
    }
}
