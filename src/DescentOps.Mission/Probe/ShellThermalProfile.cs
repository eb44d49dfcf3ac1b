using DescentOps.Scenarios.Model;

namespace DescentOps.Mission.Probe;

/// <summary>
/// Ice temperature and pressure down a conductive shell. For a conductivity k = a/T and no internal heat
/// the steady profile is T(z) = Ts (Tb/Ts)^(z/H) (the standard closed form, e.g. Petrenko and Whitworth
/// 1999, Physics of Ice, for k ∝ 1/T), where Tb is the freezing point of the ocean at the base pressure.
/// </summary>
public sealed class ShellThermalProfile
{
    private readonly ShellModel _shell;
    private readonly double _gravityMPerS2;

    /// <summary>Mean density of the ice column, kg/m³, for hydrostatic pressure (ice Ih near 150-250 K).</summary>
    public const double ColumnIceDensityKgPerM3 = 920.0;

    public ShellThermalProfile(ShellModel shell, double gravityMPerS2)
    {
        _shell = shell;
        _gravityMPerS2 = gravityMPerS2;
        BaseTemperatureK = SeawaterFreezingPoint.TemperatureK(shell.OceanSalinityKgPerKg * 1000.0, PressureAtPa(shell.ThicknessM));
    }

    public double BaseTemperatureK { get; }

    public double PressureAtPa(double depthM) => ColumnIceDensityKgPerM3 * _gravityMPerS2 * Math.Clamp(depthM, 0, _shell.ThicknessM);

    public double TemperatureAtK(double depthM)
    {
        var fraction = Math.Clamp(depthM / _shell.ThicknessM, 0.0, 1.0);
        return _shell.SurfaceTemperatureK * Math.Pow(BaseTemperatureK / _shell.SurfaceTemperatureK, fraction);
    }

    /// <summary>
    /// Melting point of the ice at depth: pure ice Ih lowered by pressure along the Clausius-Clapeyron
    /// slope near the triple point, about -7.4e-8 K/Pa (Petrenko and Whitworth 1999; from memory).
    /// </summary>
    public double MeltingTemperatureAtK(double depthM) => 273.16 - (7.4e-8 * PressureAtPa(depthM));
}
