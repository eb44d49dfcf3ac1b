namespace DescentOps.Scenarios.Model;

/// <summary>
/// The radio relays a probe carries: how many, where they are dropped (every <see cref="IntervalM"/> of depth, or at
/// <see cref="DropDepthsM"/>, or only by telecommand), each relay's radio (levels in dB, dBm and dBi), battery, power
/// draw and buffer, and the ice conductivity set that sets the radio's range.
/// </summary>
public sealed record RelayPlanModel(
    int Carried,
    double? IntervalM,
    IReadOnlyList<double> DropDepthsM,
    double TransmitPowerDbm,
    double AntennaGainDbi,
    double FrequencyHz,
    double BandwidthHz,
    double NoiseFigureDb,
    double RequiredSnrDb,
    double RequiredMarginDb,
    double MiscLossDb,
    string Conductivity,
    double BatteryEnergyJ,
    double PowerDrawW,
    int BufferFrames,
    double ForwardingDelayS);
