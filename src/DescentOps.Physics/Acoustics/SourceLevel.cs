namespace DescentOps.Physics.Acoustics;

/// <summary>Source level of a projector from its radiated acoustic power.</summary>
public static class SourceLevel
{
    /// <summary>ρc of seawater used for the customary 170.8 dB figure, Rayl (kg/(m²·s)).</summary>
    public const double NominalCharacteristicImpedanceRayl = 1.5e6;

    private const double ReferencePressurePa = 1e-6;
    private const string Model = "the source level of a point projector";

    /// <summary>
    /// Intensity P/(4π r²) at 1 m, relative to the intensity of a 1 µPa plane wave, (1 µPa)²/(ρc), plus the directivity
    /// index of the projector.
    /// </summary>
    public static double FromAcousticPowerDb(double acousticPowerW, double directivityIndexDb, double characteristicImpedanceRayl = NominalCharacteristicImpedanceRayl)
    {
        ValidRange.RequirePositive(acousticPowerW, nameof(acousticPowerW), "W", Model);
        ValidRange.RequirePositive(characteristicImpedanceRayl, nameof(characteristicImpedanceRayl), "Rayl", Model);
        var intensityAtOneMetre = acousticPowerW / (4.0 * Math.PI);
        var referenceIntensity = ReferencePressurePa * ReferencePressurePa / characteristicImpedanceRayl;
        return (10.0 * Math.Log10(intensityAtOneMetre / referenceIntensity)) + directivityIndexDb;
    }
}
