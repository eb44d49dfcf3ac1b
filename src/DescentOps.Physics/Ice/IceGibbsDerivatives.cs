namespace DescentOps.Physics.Ice;

/// <summary>
/// The specific Gibbs energy of ice Ih and its first and second partial derivatives at one state; every
/// thermodynamic property of ice follows from these six numbers (IAPWS R10-06, Table 4).
/// </summary>
/// <param name="TemperatureK">State temperature.</param>
/// <param name="PressurePa">State pressure.</param>
/// <param name="GJPerKg">g.</param>
/// <param name="GtJPerKgK">∂g/∂T at constant p.</param>
/// <param name="GpM3PerKg">∂g/∂p at constant T (the specific volume).</param>
/// <param name="GttJPerKgK2">∂²g/∂T².</param>
/// <param name="GtpM3PerKgK">∂²g/∂T∂p.</param>
/// <param name="GppM3PerKgPa">∂²g/∂p².</param>
public readonly record struct IceGibbsDerivatives(
    double TemperatureK,
    double PressurePa,
    double GJPerKg,
    double GtJPerKgK,
    double GpM3PerKg,
    double GttJPerKgK2,
    double GtpM3PerKgK,
    double GppM3PerKgPa)
{
    public double DensityKgPerM3 => 1.0 / GpM3PerKg;

    public double EntropyJPerKgK => -GtJPerKgK;

    public double SpecificHeatJPerKgK => -TemperatureK * GttJPerKgK2;

    public double EnthalpyJPerKg => GJPerKg - (TemperatureK * GtJPerKgK);

    public double InternalEnergyJPerKg => GJPerKg - (TemperatureK * GtJPerKgK) - (PressurePa * GpM3PerKg);

    public double HelmholtzEnergyJPerKg => GJPerKg - (PressurePa * GpM3PerKg);

    public double ExpansionPerK => GtpM3PerKgK / GpM3PerKg;

    public double PressureCoefficientPaPerK => -GtpM3PerKgK / GppM3PerKgPa;

    public double IsothermalCompressibilityPerPa => -GppM3PerKgPa / GpM3PerKg;

    public double IsentropicCompressibilityPerPa =>
        ((GtpM3PerKgK * GtpM3PerKgK) - (GttJPerKgK2 * GppM3PerKgPa)) / (GpM3PerKg * GttJPerKgK2);
}
