namespace DescentOps.Physics.Links;

/// <summary>
/// Cabled attenuation of single-mode fibre. The ITU-T G.652.D maxima are the worst case a procurement can rely on;
/// the typical values are what good fibre measures, and the gap between them is part of the link margin story.
/// </summary>
public static class FibreAttenuation
{
    /// <summary>Typical cabled attenuation at 1310 nm (project default).</summary>
    public const double Typical1310NmDbPerKm = 0.35;

    /// <summary>Typical cabled attenuation at 1550 nm (project default).</summary>
    public const double Typical1550NmDbPerKm = 0.20;

    private const string Model = "the ITU-T G.652.D cabled attenuation limits";

    /// <summary>
    /// G.652.D cabled maximum: 0.30 dB/km in 1530–1565 nm, 0.40 dB/km elsewhere in 1310–1625 nm. Outside that window the
    /// recommendation sets no cabled limit, so there is none to return.
    /// </summary>
    public static double G652DCabledMaximumDbPerKm(double wavelengthM)
    {
        ValidRange.Require(wavelengthM, 1310e-9, 1625e-9, nameof(wavelengthM), "m", Model);
        return wavelengthM is >= 1530e-9 and <= 1565e-9 ? 0.30 : 0.40;
    }
}
