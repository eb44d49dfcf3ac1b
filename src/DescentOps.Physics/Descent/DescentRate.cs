namespace DescentOps.Physics.Descent;

/// <summary>
/// The descent at one depth and power setting: regime, axial speed, the local ice state, and where the head
/// and wall power go (sensible + latent + lateral loss + wall surplus = head + wall power in the melting regime).
/// </summary>
public sealed record DescentRate(
    DescentRegimeKind Regime,
    double VelocityMPerS,
    double IceTemperatureK,
    double MeltingTemperatureK,
    double PressurePa,
    double SensibleW,
    double LatentW,
    double LateralLossW,
    double WallSurplusW,
    bool WallPowerSufficient);
