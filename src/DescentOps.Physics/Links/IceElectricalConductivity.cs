namespace DescentOps.Physics.Links;

/// <summary>
/// High-frequency (HF–UHF) electrical conductivity of ice, σ∞(T) as the sum of Arrhenius terms (MacGregor et al. 2007,
/// impurity form after Wolff et al. 1997). It sets how fast radio between relay transceivers fades in the shell.
/// </summary>
public static class IceElectricalConductivity
{
    /// <summary>Boltzmann constant, eV/K (CODATA).</summary>
    public const double BoltzmannEvPerK = 8.617333262e-5;

    /// <summary>
    /// Coldest temperature accepted. The fits use polar ice of about −60 to −2 °C; colder ice is nearly lossless, so
    /// carrying the Arrhenius law down to a 100 K surface changes the path loss by almost nothing.
    /// </summary>
    public const double MinimumTemperatureK = 90.0;

    /// <summary>Melting point at one atmosphere; above it there is no ice.</summary>
    public const double MaximumTemperatureK = 273.15;

    private const string Model = "the Arrhenius conductivity of ice (MacGregor et al. 2007)";

    /// <summary>
    /// σ∞ in S/m. Near melting, premelting and brine raise σ above this (MacGregor's code offers ×2 above 263 K), and
    /// marine or brine-bearing ice needs a layer of its own: this function models neither.
    /// </summary>
    public static double SPerM(double temperatureK, IceConductivityParameters parameters, IceImpurities impurities)
    {
        ArgumentNullException.ThrowIfNull(parameters);
        ArgumentNullException.ThrowIfNull(impurities);
        ValidRange.Require(temperatureK, MinimumTemperatureK, MaximumTemperatureK, nameof(temperatureK), "K", Model);
        ValidRange.RequireNonNegative(impurities.HydrogenIonMolPerM3, nameof(impurities.HydrogenIonMolPerM3), "mol/m³", Model);
        ValidRange.RequireNonNegative(impurities.ChlorideMolPerM3, nameof(impurities.ChlorideMolPerM3), "mol/m³", Model);
        ValidRange.RequireNonNegative(impurities.AmmoniumMolPerM3, nameof(impurities.AmmoniumMolPerM3), "mol/m³", Model);
        var x = (1.0 / parameters.ReferenceTemperatureK) - (1.0 / temperatureK);
        double Term(double prefactor, double energyEv) => prefactor * Math.Exp(energyEv / BoltzmannEvPerK * x);
        return Term(parameters.PureConductivitySPerM, parameters.PureActivationEnergyEv)
            + Term(parameters.HydrogenMolarConductivitySM2PerMol * impurities.HydrogenIonMolPerM3, parameters.HydrogenActivationEnergyEv)
            + Term(parameters.ChlorideMolarConductivitySM2PerMol * impurities.ChlorideMolPerM3, parameters.ChlorideActivationEnergyEv)
            + Term(parameters.AmmoniumMolarConductivitySM2PerMol * impurities.AmmoniumMolPerM3, parameters.AmmoniumActivationEnergyEv);
    }
}
