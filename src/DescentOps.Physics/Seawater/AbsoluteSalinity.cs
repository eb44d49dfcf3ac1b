namespace DescentOps.Physics.Seawater;

/// <summary>
/// Absolute Salinity of reference-composition seawater from practical salinity, S_A = S_P · 35.16504/35 g/kg
/// (TEOS-10, with no regional salinity anomaly), and back. An ocean of other salts has no such fixed ratio.
/// </summary>
public static class AbsoluteSalinity
{
    /// <summary>The TEOS-10 ratio u_PS = 35.16504/35 g/kg.</summary>
    public const double GPerKgPerPracticalUnit = 35.16504 / 35.0;

    public static double FromPracticalGPerKg(double practicalSalinity) => practicalSalinity * GPerKgPerPracticalUnit;

    public static double ToPractical(double absoluteSalinityGPerKg) => absoluteSalinityGPerKg * 35.0 / 35.16504;
}
