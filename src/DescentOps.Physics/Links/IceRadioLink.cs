namespace DescentOps.Physics.Links;

/// <summary>
/// A radio hop between two relay transceivers frozen into the shell. Gains are for antennas embedded in ice;
/// borehole geometry, refrozen interfaces and detuning belong in <see cref="MiscLossDb"/> (3 dB, RULE).
/// </summary>
public sealed record IceRadioLink(
    double TransmitPowerDbm,
    double TransmitGainDbi,
    double ReceiveGainDbi,
    double FrequencyHz,
    double BandwidthHz,
    double NoiseFigureDb,
    double RequiredSnrDb,
    double RequiredMarginDb,
    double MiscLossDb,
    double RelativePermittivity);
