namespace DescentOps.Physics.Water;

/// <summary>
/// Liquid water near 0 °C for the melt film and the gap around the probe. Held constant (MODEL): the film stays
/// within tens of kelvin of freezing, where these change by a few per cent at most.
/// </summary>
public static class LiquidWater
{
    /// <summary>Density near 0 °C (IAPWS-95 / Kell; from memory).</summary>
    public const double DensityKgPerM3 = 999.84;

    /// <summary>Isobaric heat capacity near 0 °C (IAPWS-95; from memory).</summary>
    public const double SpecificHeatJPerKgK = 4219.9;

    /// <summary>Dynamic viscosity at 273.15 K from the IAPWS 2008 viscosity release (computed in the reference note).</summary>
    public const double ViscosityPaS = 1.792e-3;

    /// <summary>Thermal conductivity at 273.15 K from the IAPWS 2011 conductivity release without the critical term (computed in the reference note).</summary>
    public const double ConductivityWPerMK = 0.5556;

    /// <summary>Saturated-liquid density at the triple point, IAPWS-95 (from memory); gives the liquid's enthalpy p_t·v there.</summary>
    public const double TriplePointDensityKgPerM3 = 999.793;
}
