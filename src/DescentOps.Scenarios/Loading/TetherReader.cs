using DescentOps.Scenarios.Model;

namespace DescentOps.Scenarios.Loading;

/// <summary>The tether section's optical budget: each field left out takes the reference transceiver's value.</summary>
internal static class TetherReader
{
    internal static FibreOpticsModel Optics(BoundSection tether)
    {
        var d = FibreOpticsModel.Default;
        return new FibreOpticsModel(
            tether.OptionalText("transceiver") ?? d.Transceiver,
            tether.OptionalNumber("attenuation"),
            tether.OptionalNumber("transmit_power"),
            tether.OptionalNumber("receiver_sensitivity"),
            (int)(tether.OptionalInteger("splices") ?? d.SpliceCount),
            tether.OptionalNumber("splice_loss") ?? d.SpliceLossDb,
            (int)(tether.OptionalInteger("connectors") ?? d.ConnectorCount),
            tether.OptionalNumber("connector_loss") ?? d.ConnectorLossDb,
            tether.OptionalNumber("bend_loss") ?? d.BendLossDb,
            tether.OptionalNumber("pack_loss") ?? d.PackLossDb,
            tether.OptionalNumber("required_margin") ?? d.RequiredMarginDb);
    }
}
