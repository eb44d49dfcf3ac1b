namespace DescentOps.Scenarios.Model;

/// <summary>
/// The tether's optical budget as a scenario sets it: a transceiver class and the losses along the fibre, levels in dB
/// and dBm. Attenuation, launch power and sensitivity are null when the class and wavelength decide them.
/// </summary>
public sealed record FibreOpticsModel(
    string Transceiver,
    double? AttenuationDbPerKm,
    double? TransmitPowerDbm,
    double? ReceiverSensitivityDbm,
    int SpliceCount,
    double SpliceLossDb,
    int ConnectorCount,
    double ConnectorLossDb,
    double BendLossDb,
    double PackLossDb,
    double RequiredMarginDb)
{
    /// <summary>1000BASE-LX, typical fibre, no splices, two connector pairs at 0.3 dB (common practice, no source), margin ≥ 0.</summary>
    public static FibreOpticsModel Default { get; } = new("1000base-lx", null, null, null, 0, 0.05, 2, 0.3, 0.0, 0.0, 0.0);
}
