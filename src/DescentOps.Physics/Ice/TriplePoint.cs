namespace DescentOps.Physics.Ice;

/// <summary>
/// The solid–liquid–vapour triple point of ordinary water and the lower end of the ice Ih melting curve, the
/// anchors of IAPWS R10-06 and R14-08 (Wagner, Riethmann, Feistel and Harvey 2011, J. Phys. Chem. Ref. Data 40, 043103).
/// </summary>
public static class TriplePoint
{
    /// <summary>Triple-point temperature (defining value of the temperature scale).</summary>
    public const double TemperatureK = 273.16;

    /// <summary>Triple-point pressure used by IAPWS R10-06 and R14-08.</summary>
    public const double PressurePa = 611.657;

    /// <summary>Ice Ih – ice III – liquid triple point: below it the Ih melting curve ends.</summary>
    public const double IhIiiLiquidTemperatureK = 251.165;

    /// <summary>Pressure of the ice Ih – ice III – liquid triple point.</summary>
    public const double IhIiiLiquidPressurePa = 208.566e6;

    /// <summary>Normal pressure, the reference pressure of R10-06's g0(p) expansion and of handbook tables.</summary>
    public const double NormalPressurePa = 101_325.0;
}
