namespace DescentOps.Physics.Acoustics;

/// <summary>
/// One acoustic modem link: everything in the passive sonar equation except the range.
/// A <see cref="TransitionRangeM"/> of zero selects pure power-law spreading with <see cref="SpreadingExponent"/>;
/// a positive one selects spherical spreading to that range and cylindrical beyond.
/// </summary>
/// <param name="SourceLevelDb">dB re 1 µPa at 1 m, directivity of the projector included.</param>
/// <param name="AbsorptionDbPerKm">From <see cref="SeawaterAbsorption"/> at the carrier.</param>
/// <param name="SpreadingExponent">k in k·10·log10 r, between 1 and 2.</param>
/// <param name="TransitionRangeM">Spherical-to-cylindrical range, or 0.</param>
/// <param name="BandwidthHz">Receiver noise bandwidth.</param>
/// <param name="AmbientNoiseSpectralLevelDb">dB re 1 µPa²/Hz at the carrier.</param>
/// <param name="SelfNoiseSpectralLevelDb">The receiver's own noise, dB re 1 µPa²/Hz: the floor under quiet ice.</param>
/// <param name="ReceiverDirectivityIndexDb">Gain of the receiving array against isotropic noise.</param>
/// <param name="DetectionThresholdDb">SNR in the band that the modem needs for its target error rate.</param>
public sealed record AcousticLink(
    double SourceLevelDb,
    double AbsorptionDbPerKm,
    double SpreadingExponent,
    double TransitionRangeM,
    double BandwidthHz,
    double AmbientNoiseSpectralLevelDb,
    double SelfNoiseSpectralLevelDb,
    double ReceiverDirectivityIndexDb,
    double DetectionThresholdDb);
