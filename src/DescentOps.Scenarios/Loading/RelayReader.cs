using DescentOps.Scenarios.Model;

namespace DescentOps.Scenarios.Loading;

/// <summary>The relays section: how many the probe carries, where it drops them, and their radios.</summary>
internal static class RelayReader
{
    /// <summary>
    /// The relays, with the defaults of the physics reference's relay example (30 dBm, 0 dBi, 100 MHz, 10 kHz, NF 5 dB,
    /// SNR 10 dB, margin 6 dB) and its 3 dB rule for borehole losses.
    /// </summary>
    internal static RelayPlanModel? Read(BoundSection? relays, double shellThicknessM)
    {
        if (relays is null) return null;
        var drops = relays.List("drops").Select(d => d.Quantity("depth")).Order().ToList();
        var interval = relays.OptionalQuantity("interval");
        // Without a count, the probe carries one relay for each planned drop: each listed depth, or each whole interval
        // above the ocean.
        var planned = interval is { } every ? (int)Math.Min(1000, Math.Ceiling(shellThicknessM / every) - 1) : drops.Count;
        var carried = relays.OptionalInteger("carried");
        return new RelayPlanModel(
            (int)(carried ?? Math.Max(planned, 0)),
            interval,
            drops,
            relays.OptionalNumber("transmit_power") ?? 30.0,
            relays.OptionalNumber("antenna_gain") ?? 0.0,
            relays.OptionalQuantity("frequency") ?? 100e6,
            relays.OptionalQuantity("bandwidth") ?? 10e3,
            relays.OptionalNumber("noise_figure") ?? 5.0,
            relays.OptionalNumber("required_snr") ?? 10.0,
            relays.OptionalNumber("required_margin") ?? 6.0,
            relays.OptionalNumber("misc_loss") ?? 3.0,
            relays.OptionalText("conductivity") ?? "m07-std",
            relays.Quantity("battery"),
            relays.Quantity("power_draw"),
            (int)(relays.OptionalInteger("buffer_frames") ?? 0),
            relays.OptionalQuantity("forwarding_delay") ?? 0.0);
    }
}
