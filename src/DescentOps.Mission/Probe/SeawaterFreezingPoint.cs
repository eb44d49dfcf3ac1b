namespace DescentOps.Mission.Probe;

/// <summary>
/// Freezing point of seawater, UNESCO 1983 (Fofonoff and Millard, "Algorithms for computation of
/// fundamental properties of seawater", UNESCO Tech. Pap. Mar. Sci. 44, p. 30; Millero 1978):
/// tf = -0.0575 S + 1.710523e-3 S^1.5 - 2.154996e-4 S² - 7.53e-4 p, S practical salinity, p in decibar.
/// Its check value: S = 40, p = 500 dbar gives tf = -2.588567 °C.
/// </summary>
public static class SeawaterFreezingPoint
{
    public static double TemperatureK(double practicalSalinity, double pressurePa)
    {
        var s = practicalSalinity;
        var decibar = pressurePa / 1.0e4;
        var celsius = (-0.0575 * s) + (1.710523e-3 * s * Math.Sqrt(s)) - (2.154996e-4 * s * s) - (7.53e-4 * decibar);
        return celsius + 273.15;
    }
}
