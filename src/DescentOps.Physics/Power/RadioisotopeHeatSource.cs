namespace DescentOps.Physics.Power;

/// <summary>
/// A radioisotope heat source with a thermoelectric or dynamic converter: heat decays with the isotope, electric output
/// decays faster because the converter itself degrades.
/// </summary>
public static class RadioisotopeHeatSource
{
    /// <summary>Pu-238 half-life, 87.7 years (of 365.25 days).</summary>
    public const double Plutonium238HalfLifeS = 87.7 * SecondsPerYear;

    /// <summary>Pu-238 alpha decay energy, about 5.593 MeV (from memory), in J.</summary>
    public const double Plutonium238DecayEnergyJ = 5.593e6 * JoulePerElectronVolt;

    /// <summary>Pu-238 molar mass, 238.0496 g/mol, in kg/mol.</summary>
    public const double Plutonium238MolarMassKgPerMol = 238.0496e-3;

    /// <summary>Julian year, the unit behind "per year" rates here.</summary>
    public const double SecondsPerYear = 365.25 * 86400.0;

    private const double AvogadroPerMol = 6.02214076e23;
    private const double JoulePerElectronVolt = 1.602176634e-19;
    private const string Model = "the radioisotope heat source";

    /// <summary>Activity of the pure isotope per kilogram, (ln 2/t½)·N_A/M.</summary>
    public static double SpecificActivityBqPerKg(double halfLifeS, double molarMassKgPerMol)
    {
        ValidRange.RequirePositive(halfLifeS, nameof(halfLifeS), "s", Model);
        ValidRange.RequirePositive(molarMassKgPerMol, nameof(molarMassKgPerMol), "kg/mol", Model);
        return Math.Log(2.0) / halfLifeS * AvogadroPerMol / molarMassKgPerMol;
    }

    /// <summary>
    /// Decay heat of the pure isotope per kilogram, all decay energy deposited locally. Oxide fuel of real isotopic
    /// purity gives less per kilogram of fuel.
    /// </summary>
    public static double SpecificThermalPowerWPerKg(double halfLifeS, double decayEnergyJ, double molarMassKgPerMol)
    {
        ValidRange.RequirePositive(decayEnergyJ, nameof(decayEnergyJ), "J", Model);
        return SpecificActivityBqPerKg(halfLifeS, molarMassKgPerMol) * decayEnergyJ;
    }

    /// <summary>Fraction of the initial heat left after a time, 2^(−t/t½).</summary>
    public static double ThermalFraction(double elapsedS, double halfLifeS)
    {
        ValidRange.RequireNonNegative(elapsedS, nameof(elapsedS), "s", Model);
        ValidRange.RequirePositive(halfLifeS, nameof(halfLifeS), "s", Model);
        return Math.Pow(2.0, -elapsedS / halfLifeS);
    }

    /// <summary>
    /// Heat, electric power and rejected heat after a time: P_e = η0·P_th(t)·(1 − δ)^years. The waste heat is what keeps
    /// a melt probe's batteries and electronics warm.
    /// </summary>
    public static RadioisotopeOutput Output(double initialThermalPowerW, double initialConversionEfficiency, double converterDegradationFractionPerYear, double elapsedS, double halfLifeS = Plutonium238HalfLifeS)
    {
        ValidRange.RequirePositive(initialThermalPowerW, nameof(initialThermalPowerW), "W", Model);
        ValidRange.Require(initialConversionEfficiency, 0.0, 1.0, nameof(initialConversionEfficiency), "(fraction)", Model);
        ValidRange.Require(converterDegradationFractionPerYear, 0.0, 1.0, nameof(converterDegradationFractionPerYear), "(fraction per year)", Model);
        var thermal = initialThermalPowerW * ThermalFraction(elapsedS, halfLifeS);
        var electric = initialConversionEfficiency * thermal * Math.Pow(1.0 - converterDegradationFractionPerYear, elapsedS / SecondsPerYear);
        return new RadioisotopeOutput(thermal, electric, thermal - electric);
    }
}
