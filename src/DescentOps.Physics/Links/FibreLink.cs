namespace DescentOps.Physics.Links;

/// <summary>
/// The fibre tether's optical path at one instant. Length is what has been paid out; fibre still on the spool shows up
/// as <see cref="PackLossDb"/>, and spool and borehole bends as <see cref="BendLossDb"/> (see <see cref="MacroBendEnvelope"/>).
/// </summary>
/// <param name="TransmitPowerDbm">Launch power; use the class minimum for a worst case.</param>
/// <param name="ReceiverSensitivityDbm">At the target bit error rate.</param>
/// <param name="PenaltyDb">Dispersion and other power penalties.</param>
/// <param name="AttenuationDbPerKm">Cabled attenuation at the wavelength.</param>
/// <param name="LengthM">Fibre length in the optical path.</param>
/// <param name="SpliceCount">Fusion splices.</param>
/// <param name="SpliceLossDb">Loss per splice (0.05 dB default; 0.3 dB TIA-568 maximum, from memory).</param>
/// <param name="ConnectorCount">Mated connector pairs.</param>
/// <param name="ConnectorLossDb">Loss per pair (0.3 dB default; 0.75 dB TIA-568 maximum, from memory).</param>
/// <param name="BendLossDb">Macro-bend loss, spool and borehole.</param>
/// <param name="PackLossDb">Excess loss of fibre still wound on the spool (1 dB, RULE).</param>
/// <param name="RotaryJointLossDb">Only if the spool rotates (1.5 dB, RULE).</param>
/// <param name="AgeingAllowanceDb">End-of-life allowance.</param>
/// <param name="RequiredMarginDb">Margin the operators demand before calling the link up (3 dB, RULE).</param>
public sealed record FibreLink(
    double TransmitPowerDbm,
    double ReceiverSensitivityDbm,
    double PenaltyDb,
    double AttenuationDbPerKm,
    double LengthM,
    int SpliceCount,
    double SpliceLossDb,
    int ConnectorCount,
    double ConnectorLossDb,
    double BendLossDb,
    double PackLossDb,
    double RotaryJointLossDb,
    double AgeingAllowanceDb,
    double RequiredMarginDb);
