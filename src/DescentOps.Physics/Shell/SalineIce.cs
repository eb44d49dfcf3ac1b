using DescentOps.Physics.Ice;
using DescentOps.Physics.Water;

namespace DescentOps.Physics.Shell;

/// <summary>
/// Melting temperature and brine content of ice that holds salt.
/// </summary>
public static class SalineIce
{
    /// <summary>
    /// T_m(S, p) = T_m,pure(p) (IAPWS R14-08) + salt depression of the UNESCO 1983 formula at zero sea pressure.
    /// MODEL: the pressure effect comes from the pure-ice curve, which holds to 208 MPa, rather than from the
    /// formula's linear term, which is valid only to 500 dbar. Below S = 4 the formula is used down to S = 0, where it
    /// is exactly zero (pure ice): interpolation between a known limit and the formula's range, not extrapolation.
    /// </summary>
    public static double MeltingTemperatureK(double salinityGPerKg, double pressurePa)
    {
        ValidRange.Require(salinityGPerKg, 0.0, 40.0, nameof(salinityGPerKg), "g/kg", "the saline melting point (UNESCO 1983 salt term)");
        return MeltingCurve.TemperatureK(pressurePa) + SeawaterFreezingPoint.SalinityTermC(salinityGPerKg);
    }

    /// <summary>
    /// Brine volume fraction (0–1) of sea-ice-like ice, Frankenstein and Garner (1967), J. Glaciol. 6, 943 (from memory):
    /// v_b/v = S (0.532 − 49.185/t) ‰, t in °C, valid −22.9 ≤ t ≤ −0.5 °C.
    /// </summary>
    public static double BrineVolumeFraction(double salinityGPerKg, double temperatureK)
    {
        ValidRange.Require(salinityGPerKg, 0.0, 40.0, nameof(salinityGPerKg), "g/kg", "the Frankenstein–Garner brine volume");
        var tC = temperatureK - SeawaterFreezingPoint.CelsiusZeroK;
        ValidRange.Require(tC, -22.9, -0.5, nameof(temperatureK) + " (as °C)", "°C", "the Frankenstein–Garner brine volume");
        return salinityGPerKg * (0.532 - (49.185 / tC)) * 1e-3;
    }
}
