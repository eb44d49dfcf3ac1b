namespace DescentOps.Scenarios.Model;

/// <summary>
/// The acoustic link between the probe and its vehicles: carrier frequency, levels of the sonar equation (dB),
/// spreading exponent, the ocean's temperature for absorption (null: the ocean's own, see
/// <see cref="ShellModel.OceanTemperatureK"/>) and pH, the absorption formula, and how often a vehicle
/// sends a data message.
/// </summary>
public sealed record AcousticsModel(
    double FrequencyHz,
    double SourceLevelDb,
    double NoiseSpectralLevelDb,
    double BandwidthHz,
    double DetectionThresholdDb,
    double SpreadingExponent,
    double? OceanTemperatureK,
    double PH,
    AbsorptionFormula Formula,
    double MessageIntervalS);
