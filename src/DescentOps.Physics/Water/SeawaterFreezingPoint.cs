namespace DescentOps.Physics.Water;

/// <summary>
/// Freezing point of seawater, UNESCO (1983) algorithm (Fofonoff and Millard, UNESCO Tech. Pap. Mar. Sci. 44, after
/// Millero and Leung 1976), valid for practical salinity 4–40 and 0–500 dbar. It agrees with TEOS-10 to a few mK there.
/// </summary>
public static class SeawaterFreezingPoint
{
    /// <summary>Celsius-to-kelvin offset.</summary>
    public const double CelsiusZeroK = PhysicalConstants.CelsiusZeroK;

    private const string Model = "the UNESCO 1983 seawater freezing point";
    private const double PascalPerDecibar = 1e4;

    /// <summary>Freezing temperature at a practical salinity and sea pressure (pressure above the surface, Pa).</summary>
    public static double TemperatureK(double practicalSalinity, double seaPressurePa)
    {
        ValidRange.Require(practicalSalinity, 4.0, 40.0, nameof(practicalSalinity), "(practical salinity)", Model);
        ValidRange.Require(seaPressurePa, 0.0, 500.0 * PascalPerDecibar, nameof(seaPressurePa), "Pa", Model);
        return CelsiusZeroK + SalinityTermC(practicalSalinity) - (7.53e-4 * seaPressurePa / PascalPerDecibar);
    }

    /// <summary>The salt part of the formula at zero sea pressure, °C (equal to the depression in K).</summary>
    internal static double SalinityTermC(double practicalSalinity) =>
        (-0.0575 * practicalSalinity) + (1.710523e-3 * Math.Pow(practicalSalinity, 1.5)) - (2.154996e-4 * practicalSalinity * practicalSalinity);
}
