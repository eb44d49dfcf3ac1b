namespace DescentOps.Physics.Ocean;

/// <summary>
/// Practical salinity from a salt mass fraction read as reference-composition absolute salinity, S_P = S_R·35/35.16504
/// (the TEOS-10 reference ratio). An ocean of other salts has no such fixed ratio; this is the standard-seawater reading.
/// </summary>
public static class PracticalSalinity
{
    /// <summary>Reference salinity, g/kg, of practical salinity 35 (TEOS-10).</summary>
    public const double ReferenceSalinityOf35GPerKg = 35.16504;

    public static double FromAbsoluteKgPerKg(double saltMassFractionKgPerKg)
    {
        ValidRange.Require(saltMassFractionKgPerKg, 0.0, 0.1, nameof(saltMassFractionKgPerKg), "kg/kg", "the reference-composition salinity conversion");
        // One multiplication and one division: the reference salinity itself then maps to 35 exactly, not to a hair
        // above the top of the absorption fits' salinity range.
        return saltMassFractionKgPerKg * 35e3 / ReferenceSalinityOf35GPerKg;
    }
}
