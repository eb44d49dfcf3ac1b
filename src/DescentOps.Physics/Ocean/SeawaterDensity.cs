namespace DescentOps.Physics.Ocean;

/// <summary>
/// In-situ density of seawater by the International Equation of State of Seawater 1980 (EOS-80): Millero and
/// Poisson (1981) at one atmosphere and the secant bulk modulus of Millero, Chen, Bradshaw and Schleicher (1980), as
/// printed in Fofonoff and Millard (1983), UNESCO Tech. Pap. Mar. Sci. 44, eqs. 13–19.
/// Salinity is <b>practical salinity</b> (PSS-78, dimensionless), not Absolute Salinity; temperature is ITS-90 and
/// pressure is sea pressure (absolute minus one standard atmosphere).
/// </summary>
public static class SeawaterDensity
{
    /// <summary>Largest practical salinity the equation was fitted to.</summary>
    public const double MaximumPracticalSalinity = 42.0;

    /// <summary>Largest sea pressure of the fit, 10 000 dbar.</summary>
    public const double MaximumSeaPressurePa = 100e6;

    private const string Model = "EOS-80 (UNESCO 1983) seawater density";
    private const double PascalPerBar = 1e5;

    /// <summary>Density, surface density and secant bulk modulus at one state.</summary>
    public static SeawaterDensityState Eos80(double practicalSalinity, double temperatureK, double seaPressurePa)
    {
        ValidRange.Require(practicalSalinity, 0.0, MaximumPracticalSalinity, nameof(practicalSalinity), "(practical salinity)", Model);
        ValidRange.Require(temperatureK, Ipts68.CelsiusZeroK - 2.0, Ipts68.CelsiusZeroK + 40.0, nameof(temperatureK), "K", Model);
        ValidRange.Require(seaPressurePa, 0.0, MaximumSeaPressurePa, nameof(seaPressurePa), "Pa", Model);

        var t = Ipts68.CelsiusFromIts90K(temperatureK);
        var s = practicalSalinity;
        var s15 = s * Math.Sqrt(s);
        var p = seaPressurePa / PascalPerBar;

        var rhoW = 999.842594 + (t * (6.793952e-2 + (t * (-9.095290e-3 + (t * (1.001685e-4 + (t * (-1.120083e-6 + (t * 6.536332e-9)))))))));
        var b = 8.24493e-1 + (t * (-4.0899e-3 + (t * (7.6438e-5 + (t * (-8.2467e-7 + (t * 5.3875e-9)))))));
        var c = -5.72466e-3 + (t * (1.0227e-4 - (t * 1.6546e-6)));
        var rho0 = rhoW + (b * s) + (c * s15) + (4.8314e-4 * s * s);

        var kW = 19652.21 + (t * (148.4206 + (t * (-2.327105 + (t * (1.360477e-2 - (t * 5.155288e-5)))))));
        var f = 54.6746 + (t * (-0.603459 + (t * (1.09987e-2 - (t * 6.1670e-5)))));
        var g = 7.944e-2 + (t * (1.6483e-2 - (t * 5.3009e-4)));
        var k0 = kW + (f * s) + (g * s15);

        var aW = 3.239908 + (t * (1.43713e-3 + (t * (1.16092e-4 - (t * 5.77905e-7)))));
        var a = aW + (s * (2.2838e-3 + (t * (-1.0981e-5 - (t * 1.6078e-6))))) + (1.91075e-4 * s15);
        var bW = 8.50935e-5 + (t * (-6.12293e-6 + (t * 5.2787e-8)));
        var bPrime = bW + (s * (-9.9348e-7 + (t * (2.0816e-8 + (t * 9.1697e-10)))));
        var kBar = k0 + (p * (a + (bPrime * p)));

        return new SeawaterDensityState(rho0 / (1.0 - (p / kBar)), rho0, kBar * PascalPerBar);
    }

    /// <summary>In-situ density only.</summary>
    public static double Eos80KgPerM3(double practicalSalinity, double temperatureK, double seaPressurePa) =>
        Eos80(practicalSalinity, temperatureK, seaPressurePa).DensityKgPerM3;
}
