namespace DescentOps.Physics.Ice;

/// <summary>
/// Thermal conductivity of ice Ih against temperature (no IAPWS release covers it), and its Kirchhoff potential
/// Φ = ∫ k dT, which makes steady conduction with k(T) exact.
/// </summary>
/// <remarks>
/// Validity: Yen (1981) states 60–273 K. For the other fits the sources' own ranges were not confirmed for this
/// library, so we restrict them (MODEL) to 50 K (the coldest icy-moon surfaces) up to the triple point.
/// </remarks>
public static class IceConductivity
{
    /// <summary>Coefficient a of the closed form k = a/T (Petrenko and Whitworth 1999).</summary>
    public const double ReciprocalCoefficientWPerM = 651.0;

    /// <summary>Lowest temperature at which a fit is accepted, K.</summary>
    public static double MinimumTemperatureK(IceConductivityFit fit) => fit == IceConductivityFit.Yen1981 ? 60.0 : 50.0;

    /// <summary>Thermal conductivity at a temperature.</summary>
    public static double ConductivityWPerMK(double temperatureK, IceConductivityFit fit = IceConductivityFit.AnderssonInaba2005)
    {
        Check(temperatureK, fit);
        return fit switch
        {
            IceConductivityFit.AnderssonInaba2005 => (632.0 / temperatureK) + 0.38 - (0.00197 * temperatureK),
            IceConductivityFit.Klinger1980 => 567.0 / temperatureK,
            IceConductivityFit.PetrenkoWhitworth1999 => ReciprocalCoefficientWPerM / temperatureK,
            IceConductivityFit.Yen1981 => 9.828 * Math.Exp(-0.0057 * temperatureK),
            _ => throw new ArgumentOutOfRangeException(nameof(fit), fit, "Unknown conductivity fit."),
        };
    }

    /// <summary>Kirchhoff potential Φ = ∫_{T1}^{T2} k dT in closed form for each fit (positive when T2 &gt; T1).</summary>
    public static double KirchhoffPotentialWPerM(double lowerTemperatureK, double upperTemperatureK, IceConductivityFit fit = IceConductivityFit.AnderssonInaba2005)
    {
        Check(lowerTemperatureK, fit);
        Check(upperTemperatureK, fit);
        double t1 = lowerTemperatureK, t2 = upperTemperatureK;
        return fit switch
        {
            IceConductivityFit.AnderssonInaba2005 => (632.0 * Math.Log(t2 / t1)) + (0.38 * (t2 - t1)) - (0.000985 * ((t2 * t2) - (t1 * t1))),
            IceConductivityFit.Klinger1980 => 567.0 * Math.Log(t2 / t1),
            IceConductivityFit.PetrenkoWhitworth1999 => ReciprocalCoefficientWPerM * Math.Log(t2 / t1),
            IceConductivityFit.Yen1981 => (9.828 / 0.0057) * (Math.Exp(-0.0057 * t1) - Math.Exp(-0.0057 * t2)),
            _ => throw new ArgumentOutOfRangeException(nameof(fit), fit, "Unknown conductivity fit."),
        };
    }

    /// <summary>Kirchhoff potential for k = a/T with any coefficient a (closed-form shell and probe models).</summary>
    public static double ReciprocalKirchhoffPotentialWPerM(double lowerTemperatureK, double upperTemperatureK, double coefficientWPerM = ReciprocalCoefficientWPerM)
    {
        ValidRange.RequirePositive(lowerTemperatureK, nameof(lowerTemperatureK), "K", "the k = a/T conductivity law");
        ValidRange.RequirePositive(upperTemperatureK, nameof(upperTemperatureK), "K", "the k = a/T conductivity law");
        ValidRange.RequirePositive(coefficientWPerM, nameof(coefficientWPerM), "W/m", "the k = a/T conductivity law");
        return coefficientWPerM * Math.Log(upperTemperatureK / lowerTemperatureK);
    }

    private static void Check(double temperatureK, IceConductivityFit fit) =>
        ValidRange.Require(temperatureK, MinimumTemperatureK(fit), TriplePoint.TemperatureK, nameof(temperatureK), "K", $"the {fit} ice conductivity fit");
}
