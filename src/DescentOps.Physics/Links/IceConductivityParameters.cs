namespace DescentOps.Physics.Links;

/// <summary>
/// Arrhenius parameters of the high-frequency electrical conductivity of ice: a pure-ice term and molar terms for
/// soluble impurities, each with its activation energy about a reference temperature, plus the permittivity that
/// turns conductivity into attenuation. Molar conductivities are in SI, S/m per mol/m³ (1 S/m/M = 1e-3 S·m²/mol).
/// </summary>
public sealed record IceConductivityParameters(
    string Name,
    double PureConductivitySPerM,
    double PureActivationEnergyEv,
    double HydrogenMolarConductivitySM2PerMol,
    double HydrogenActivationEnergyEv,
    double ChlorideMolarConductivitySM2PerMol,
    double ChlorideActivationEnergyEv,
    double AmmoniumMolarConductivitySM2PerMol,
    double AmmoniumActivationEnergyEv,
    double ReferenceTemperatureK,
    double RelativePermittivity)
{
    /// <summary>
    /// MacGregor et al. (2007), "Modeling englacial radar attenuation at Siple Dome, West Antarctica, using ice
    /// chemistry and temperature data", J. Geophys. Res. 112, Table 1 compilation as averaged in the authors' code.
    /// </summary>
    public static IceConductivityParameters MacGregor2007Standard { get; } = new("M07-std", 6.6e-6, 0.55, 3.2e-3, 0.20, 0.43e-3, 0.19, 0.0, 0.0, 251.0, 3.2);

    /// <summary>MacGregor et al. (2007) with the pure-ice values of Johari and Charette (1975).</summary>
    public static IceConductivityParameters MacGregor2007Adjusted { get; } = MacGregor2007Standard with { Name = "M07-adj", PureConductivitySPerM = 9.2e-6, PureActivationEnergyEv = 0.51 };

    /// <summary>The Wolff et al. (1997) based set used for a polar ice sheet, with an ammonium term.</summary>
    public static IceConductivityParameters Wolff1997 { get; } = new("W97", 9.0e-6, 0.58, 4.0e-3, 0.21, 0.55e-3, 0.23, 1.0e-3, 0.23, 258.15, 3.15);
}
