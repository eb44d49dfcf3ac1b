using DescentOps.Physics.Water;

namespace DescentOps.Physics.Ice;

/// <summary>
/// Latent heat of fusion of ice Ih along its melting curve. At the triple point it is exact thermodynamics:
/// the IAPWS-95 reference state gives liquid water u = s = 0 there, so h_liq = p_t·v_liq, and R10-06 gives h_ice.
/// Along the curve (pressure rising, T_m falling) L drops by 2.45 kJ/kg per kelvin of melting-point depression
/// (the identity dL/dT_m = Δc_p + L/T − L(∂Δv/∂T)/Δv with 273.15 K property values, as computed in the reference note;
/// MODEL: slope held constant, trusted to ±1 kJ/kg down to T_m = 269 K, i.e. p ≤ 50 MPa, and refused beyond).
/// </summary>
public static class FusionLatentHeat
{
    /// <summary>Slope dL/dT_m along the melting curve.</summary>
    public const double SlopeJPerKgK = 2450.0;

    /// <summary>Lowest melting temperature at which the linear slope is trusted.</summary>
    public const double MinimumMeltingTemperatureK = 269.0;

    /// <summary>Highest pressure at which the linear slope is trusted.</summary>
    public const double MaximumPressurePa = 50e6;

    private const string Model = "the fusion latent heat (IAPWS triple-point value with a linear melting-curve slope)";

    /// <summary>L at the triple point: h_liq − h_ice.</summary>
    public static double TriplePointJPerKg { get; } =
        (TriplePoint.PressurePa / LiquidWater.TriplePointDensityKgPerM3)
        - IceIh.EnthalpyJPerKg(TriplePoint.TemperatureK, TriplePoint.PressurePa);

    /// <summary>L at a melting temperature on the pure-ice melting curve.</summary>
    public static double AtMeltingTemperatureJPerKg(double meltingTemperatureK)
    {
        ValidRange.Require(meltingTemperatureK, MinimumMeltingTemperatureK, TriplePoint.TemperatureK, nameof(meltingTemperatureK), "K", Model);
        return TriplePointJPerKg - (SlopeJPerKgK * (TriplePoint.TemperatureK - meltingTemperatureK));
    }

    /// <summary>
    /// L at a pressure: the melting temperature of pure ice there, from R14-08. Saline ice melts lower, but the
    /// latent heat per kilogram of ice is still that of pure ice (RULE; brine-pocket enthalpy ignored).
    /// </summary>
    public static double AtPressureJPerKg(double pressurePa)
    {
        ValidRange.Require(pressurePa, TriplePoint.PressurePa, MaximumPressurePa, nameof(pressurePa), "Pa", Model);
        return AtMeltingTemperatureJPerKg(MeltingCurve.TemperatureK(pressurePa));
    }
}
