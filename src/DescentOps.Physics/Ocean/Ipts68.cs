namespace DescentOps.Physics.Ocean;

/// <summary>
/// The UNESCO 1983 (EOS-80) formulas were fitted on the IPTS-68 temperature scale, while callers work in ITS-90
/// kelvin; the two scales differ by 0.024 % in Celsius, about 2.4 mK at 10 °C (Saunders 1990, t68 = 1.00024 t90).
/// </summary>
internal static class Ipts68
{
    public const double CelsiusZeroK = PhysicalConstants.CelsiusZeroK;

    public static double CelsiusFromIts90K(double temperatureK) => 1.00024 * (temperatureK - CelsiusZeroK);
}
