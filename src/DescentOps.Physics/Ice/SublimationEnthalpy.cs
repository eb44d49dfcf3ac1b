namespace DescentOps.Physics.Ice;

/// <summary>
/// Enthalpy of sublimation of ice Ih, Murphy and Koop (2005), Q. J. R. Meteorol. Soc. 131, 1539, eq. 5 (coefficients
/// from memory; they reproduce the IAPWS triple-point value to 0.005 %), valid above 30 K.
/// </summary>
public static class SublimationEnthalpy
{
    /// <summary>Molar mass of water.</summary>
    public const double MolarMassKgPerMol = 0.018015268;

    /// <summary>Lower end of the fit's validity.</summary>
    public const double MinimumTemperatureK = 30.0;

    public static double MolarJPerMol(double temperatureK)
    {
        ValidRange.Require(temperatureK, MinimumTemperatureK, TriplePoint.TemperatureK, nameof(temperatureK), "K", "the Murphy–Koop (2005) sublimation enthalpy");
        var x = temperatureK / 123.75;
        return 46782.5 + (35.8925 * temperatureK) - (0.07414 * temperatureK * temperatureK) + (541.5 * Math.Exp(-x * x));
    }

    public static double SpecificJPerKg(double temperatureK) => MolarJPerMol(temperatureK) / MolarMassKgPerMol;
}
