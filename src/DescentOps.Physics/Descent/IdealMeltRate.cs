namespace DescentOps.Physics.Descent;

/// <summary>
/// The first energy balance of a melting head: all head power, times an efficiency, warms the ice ahead
/// from its far-field temperature to the melting point and melts it, v = η P / (π R² ρ (L + c Δ T)).
/// This is the common starting point of published melt-probe models (Aamot 1967, CRREL Research Report 194;
/// Ulamec et al. 2007, Rev. Environ. Sci. Biotechnol. 6, 71). Constant ice density and latent heat and a
/// heat capacity linear in temperature keep it closed-form; the full model replaces it.
/// </summary>
public static class IdealMeltRate
{
    /// <summary>Density of ice Ih near 250 K, kg/m³ (IAPWS R10-06 gives 919.9 at 250 K, 916.7 at 273.15 K).</summary>
    public const double IceDensityKgPerM3 = 917.0;

    /// <summary>Latent heat of fusion at 0.1 MPa, J/kg (Feistel and Wagner 2006, from IAPWS R10-06: 333.43 kJ/kg).</summary>
    public const double LatentHeatJPerKg = 333_430.0;

    /// <summary>
    /// Heat capacity of ice, c = 185 + 7.037 T J/(kg K) (a widely used linear fit to Giauque and Stout 1936;
    /// stated from memory), integrated from T∞ to Tm: the sensible heat per kilogram.
    /// </summary>
    public static double SensibleHeatJPerKg(double farFieldTemperatureK, double meltingTemperatureK)
    {
        if (farFieldTemperatureK > meltingTemperatureK) return 0.0;
        return 185.0 * (meltingTemperatureK - farFieldTemperatureK)
               + 0.5 * 7.037 * ((meltingTemperatureK * meltingTemperatureK) - (farFieldTemperatureK * farFieldTemperatureK));
    }

    /// <summary>Axial melt velocity, m/s, for head power in watts and radius in metres.</summary>
    public static double VelocityMPerS(double headPowerW, double radiusM, double farFieldTemperatureK, double meltingTemperatureK, double efficiency)
    {
        if (radiusM <= 0) throw new ArgumentOutOfRangeException(nameof(radiusM), radiusM, "The probe radius must be positive.");
        if (headPowerW <= 0) return 0.0;
        var area = Math.PI * radiusM * radiusM;
        return efficiency * headPowerW / (area * IceDensityKgPerM3 * (LatentHeatJPerKg + SensibleHeatJPerKg(farFieldTemperatureK, meltingTemperatureK)));
    }
}
