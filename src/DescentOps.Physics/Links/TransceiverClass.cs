namespace DescentOps.Physics.Links;

/// <summary>
/// Optical transceiver class: launch power window and receiver sensitivity at the class's target bit error rate.
/// The presets are IEEE 802.3 values as vendor manuals print them; the long-reach one is a common non-standard part.
/// </summary>
public sealed record TransceiverClass(string Name, double WavelengthM, double LineRateBitPerS, double MinimumTransmitPowerDbm, double MaximumTransmitPowerDbm, double ReceiverSensitivityDbm)
{
    /// <summary>100BASE-LX10, 1310 nm.</summary>
    public static TransceiverClass FastEthernetLx10 { get; } = new("100BASE-LX10", 1310e-9, 125e6, -15.0, -8.0, -25.0);

    /// <summary>1000BASE-LX, 1310 nm.</summary>
    public static TransceiverClass GigabitLx { get; } = new("1000BASE-LX", 1310e-9, 1.25e9, -11.0, -3.0, -19.0);

    /// <summary>10GBASE-LR, 1310 nm (average-power sensitivity).</summary>
    public static TransceiverClass TenGigabitLr { get; } = new("10GBASE-LR", 1310e-9, 10.3125e9, -8.2, 0.5, -14.4);

    /// <summary>Long-reach gigabit optics (LX70/ZX class), 1550 nm; not an IEEE class.</summary>
    public static TransceiverClass GigabitLongReach { get; } = new("GbE LX70/ZX", 1550e-9, 1.25e9, 0.0, 4.0, -24.0);

    /// <summary>Worst-case power budget: minimum launch power less sensitivity.</summary>
    public double WorstCaseBudgetDb => MinimumTransmitPowerDbm - ReceiverSensitivityDbm;
}
