using System.CommandLine;
using DescentOps.Physics.Links;
using DescentOps.Scenarios.Format;

namespace DescentOps.Cli.Commands.Physics;

/// <summary><c>physics fibre</c>: the optical power budget of the tether, as <see cref="FibreLinkBudget"/> evaluates it in a run.</summary>
internal static class FibreSubcommand
{
    /// <summary>Default optics: 1000BASE-LX at its minimum launch power, the worst case a procurement can rely on.</summary>
    public static TransceiverClass DefaultTransceiver => TransceiverClass.GigabitLx;

    public static Command Create()
    {
        var length = QuantityOption.Required("--length", QuantityKind.Length, "Fibre length in the optical path (paid out).");
        var wavelength = QuantityOption.WithDefault("--wavelength", QuantityKind.Length, "Wavelength, 1310 to 1625 nm; picks the typical attenuation (0.35 dB/km at 1310 nm, 0.20 dB/km at 1530–1565 nm) unless --attenuation is given.", 1310e-9, "1310 nm");
        var attenuation = new Option<double?>("--attenuation") { Description = "Cabled attenuation, dB/km. Default: typical for the wavelength (see --wavelength)." };
        var splices = new Option<int>("--splices") { Description = "Fusion splices. Default: 0.", DefaultValueFactory = _ => 0 };
        var spliceLoss = LevelOption.WithDefault("--splice-loss", "dB", "Loss per splice.", 0.05);
        var connectors = new Option<int>("--connectors") { Description = "Mated connector pairs. Default: 2 (one at each end).", DefaultValueFactory = _ => 2 };
        var connectorLoss = LevelOption.WithDefault("--connector-loss", "dB", "Loss per connector pair.", 0.3);
        var bendLoss = LevelOption.WithDefault("--bend-loss", "dB", "Macro-bend loss, spool and borehole.", 0.0);
        var packLoss = LevelOption.WithDefault("--pack-loss", "dB", "Excess loss of fibre still wound on the spool (the simulator's rule is 1 dB).", 0.0);
        var rotaryLoss = LevelOption.WithDefault("--rotary-joint-loss", "dB", "Rotary joint, only if the spool rotates (the simulator's rule is 1.5 dB).", 0.0);
        var ageing = LevelOption.WithDefault("--ageing", "dB", "End-of-life allowance.", 0.0);
        var transmitter = LevelOption.WithDefault("--transmitter-power", "dBm", "Launch power (default: the 1000BASE-LX minimum).", DefaultTransceiver.MinimumTransmitPowerDbm);
        var receiver = LevelOption.WithDefault("--receiver-sensitivity", "dBm", "Receiver sensitivity at the target bit error rate (default: 1000BASE-LX).", DefaultTransceiver.ReceiverSensitivityDbm);
        var penalty = LevelOption.WithDefault("--penalty", "dB", "Dispersion and other power penalties.", 0.0);
        var required = LevelOption.WithDefault("--required-margin", "dB", "Margin the operators demand before calling the link up.", 3.0);
        var json = PhysicsAction.JsonOption();
        var command = new Command(
            "fibre",
            "Optical budget of the tether: loss_db = attenuation·L + splices + connectors + bend + pack + rotary joint + ageing; "
            + "margin_db = transmitter power − loss − receiver sensitivity − penalty; link_up when margin_db ≥ the required margin.")
        {
            length.Option, wavelength.Option, attenuation, splices, spliceLoss.Option, connectors, connectorLoss.Option, bendLoss.Option,
            packLoss.Option, rotaryLoss.Option, ageing.Option, transmitter.Option, receiver.Option, penalty.Option, required.Option, json,
        };
        var map = new ParameterOptions
        {
            { "LengthM", length }, { "wavelengthM", wavelength }, { "AttenuationDbPerKm", attenuation }, { "SpliceCount", splices },
            { "ConnectorCount", connectors }, { "SpliceLossDb", spliceLoss }, { "ConnectorLossDb", connectorLoss },
            { "BendLossDb", bendLoss }, { "PackLossDb", packLoss }, { "RotaryJointLossDb", rotaryLoss },
            { "AgeingAllowanceDb", ageing }, { "PenaltyDb", penalty },
        };
        command.SetAction(parse => PhysicsAction.Run("fibre", parse, json, p =>
        {
            var lambda = wavelength.Value(p);
            var cabledMaximum = FibreAttenuation.G652DCabledMaximumDbPerKm(lambda);
            var perKm = p.GetValue(attenuation) ?? (lambda is >= 1530e-9 and <= 1565e-9 ? FibreAttenuation.Typical1550NmDbPerKm : FibreAttenuation.Typical1310NmDbPerKm);
            var link = new FibreLink(
                transmitter.Value(p), receiver.Value(p), penalty.Value(p), perKm, length.Value(p),
                p.GetValue(splices), spliceLoss.Value(p), p.GetValue(connectors), connectorLoss.Value(p),
                bendLoss.Value(p), packLoss.Value(p), rotaryLoss.Value(p), ageing.Value(p), required.Value(p));
            var budget = FibreLinkBudget.Evaluate(link);
            var groupIndex = lambda >= 1450e-9 ? FibreLatency.GroupIndex1550Nm : FibreLatency.GroupIndex1310Nm;
            return new PhysicsReport("fibre link budget")
                .Number("attenuation_db_per_km", "attenuation used", perKm, "dB/km")
                .Number("g652d_cabled_maximum_db_per_km", "ITU-T G.652.D cabled maximum", cabledMaximum, "dB/km")
                .Number("loss_db", "total loss", budget.TotalLossDb, "dB")
                .Number("received_power_dbm", "received power", budget.ReceivedPowerDbm, "dBm")
                .Number("margin_db", "margin over sensitivity", budget.MarginDb, "dB")
                .Flag("link_up", "link up (margin ≥ required)", budget.LinkUp)
                .Number("one_way_delay_s", "one-way delay (group index)", FibreLatency.OneWayDelayS(link.LengthM, groupIndex), "s");
        }, map));
        return command;
    }
}
