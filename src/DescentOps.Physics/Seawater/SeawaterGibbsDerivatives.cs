namespace DescentOps.Physics.Seawater;

/// <summary>
/// The TEOS-10 Gibbs function of seawater and its derivatives at one state, in SI units per kilogram of seawater
/// (salinity derivatives per g/kg of Absolute Salinity), with the properties that follow from them.
/// </summary>
public readonly record struct SeawaterGibbsDerivatives(
    double AbsoluteSalinityGPerKg,
    double TemperatureK,
    double SeaPressurePa,
    double GJPerKg,
    double GsJPerKgPerGPerKg,
    double GtJPerKgK,
    double GpM3PerKg,
    double GttJPerKgK2,
    double GtpM3PerKgK,
    double GppM3PerKgPa,
    double GstJPerKgKPerGPerKg)
{
    public double DensityKgPerM3 => 1.0 / GpM3PerKg;

    public double EntropyJPerKgK => -GtJPerKgK;

    public double EnthalpyJPerKg => GJPerKg - (TemperatureK * GtJPerKgK);

    public double SpecificHeatJPerKgK => -TemperatureK * GttJPerKgK2;

    /// <summary>Sound speed, g_p·sqrt(g_tt / (g_tp² − g_tt·g_pp)).</summary>
    public double SoundSpeedMPerS => GpM3PerKg * Math.Sqrt(GttJPerKgK2 / ((GtpM3PerKgK * GtpM3PerKgK) - (GttJPerKgK2 * GppM3PerKgPa)));

    /// <summary>Chemical potential of water in seawater, μ_W = g − S_A·∂g/∂S_A (J/kg).</summary>
    public double WaterChemicalPotentialJPerKg => AbsoluteSalinityGPerKg > 0 ? GJPerKg - (AbsoluteSalinityGPerKg * GsJPerKgPerGPerKg) : GJPerKg;

    /// <summary>∂μ_W/∂T at fixed S_A and p.</summary>
    public double WaterChemicalPotentialSlopeJPerKgK => AbsoluteSalinityGPerKg > 0 ? GtJPerKgK - (AbsoluteSalinityGPerKg * GstJPerKgKPerGPerKg) : GtJPerKgK;
}
