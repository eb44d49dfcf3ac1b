using DescentOps.Physics.Links;
using DescentOps.Scenarios.Model;

namespace DescentOps.Mission.Tether;

/// <summary>
/// The scenario's tether as an optical link for <see cref="FibreLinkBudget"/>: the transceiver class, the attenuation at
/// its wavelength, and the losses along the fibre. Following the physics model's convention, the optical length is what
/// has been paid out and the fibre still wound on the spool appears as pack loss, here in proportion to the share of the
/// spool still wound (MODEL: the excess loss comes from the wound turns, so it shrinks as they leave).
/// </summary>
public sealed class TetherOptics
{
    private readonly TetherModel _tether;
    private readonly FibreOpticsModel _optics;

    public TetherOptics(TetherModel tether)
    {
        ArgumentNullException.ThrowIfNull(tether);
        _tether = tether;
        _optics = tether.OpticsOrDefault;
        Transceiver = ClassNamed(_optics.Transceiver);
        AttenuationDbPerKm = _optics.AttenuationDbPerKm ?? TypicalAttenuationDbPerKm(Transceiver.WavelengthM);
    }

    public TransceiverClass Transceiver { get; }

    public double AttenuationDbPerKm { get; }

    /// <summary>The G.652.D cabled maximum at the transceiver's wavelength: the worst fibre a procurement may deliver.</summary>
    public double G652DMaximumDbPerKm => FibreAttenuation.G652DCabledMaximumDbPerKm(Transceiver.WavelengthM);

    /// <summary>The budget with <paramref name="paidOutM"/> of fibre out of the spool.</summary>
    public FibreLinkBudgetResult Budget(double paidOutM)
    {
        var paid = Math.Clamp(paidOutM, 0.0, _tether.LengthM);
        var woundShare = 1.0 - (paid / _tether.LengthM);
        return FibreLinkBudget.Evaluate(new FibreLink(
            _optics.TransmitPowerDbm ?? Transceiver.MinimumTransmitPowerDbm,
            _optics.ReceiverSensitivityDbm ?? Transceiver.ReceiverSensitivityDbm,
            0.0,
            AttenuationDbPerKm,
            paid,
            _optics.SpliceCount,
            _optics.SpliceLossDb,
            _optics.ConnectorCount,
            _optics.ConnectorLossDb,
            _optics.BendLossDb,
            _optics.PackLossDb * woundShare,
            0.0,
            0.0,
            _optics.RequiredMarginDb));
    }

    /// <summary>The scenario's word for a transceiver class.</summary>
    public static TransceiverClass ClassNamed(string word) => word switch
    {
        "100base-lx10" => TransceiverClass.FastEthernetLx10,
        "1000base-lx" => TransceiverClass.GigabitLx,
        "10gbase-lr" => TransceiverClass.TenGigabitLr,
        "gbe-long-reach" => TransceiverClass.GigabitLongReach,
        _ => throw new ArgumentOutOfRangeException(nameof(word), word, "no such transceiver class"),
    };

    /// <summary>The physics model's typical attenuation: 1530–1565 nm fibre is the low-loss window, the rest takes the 1310 nm value.</summary>
    public static double TypicalAttenuationDbPerKm(double wavelengthM) =>
        wavelengthM is >= 1530e-9 and <= 1565e-9 ? FibreAttenuation.Typical1550NmDbPerKm : FibreAttenuation.Typical1310NmDbPerKm;
}
