namespace DescentOps.Physics;

/// <summary>
/// Defining constants of the SI used across the models, each defined once (BIPM, The International System of Units,
/// 9th edition, 2019: exact by definition).
/// </summary>
public static class PhysicalConstants
{
    /// <summary>Speed of light in vacuum, exact since 1983.</summary>
    public const double SpeedOfLightMPerS = 299_792_458.0;

    /// <summary>0 °C in kelvin, exact (the Celsius scale's offset).</summary>
    public const double CelsiusZeroK = 273.15;
}
