namespace DescentOps.Physics.Descent;

/// <summary>
/// The descent at one depth and power setting: regime, axial speed, the local ice state, and where the head
/// and wall power go (sensible + latent + lateral loss + wall surplus = head + wall power in the melting regime).
/// </summary>
public sealed record DescentRate(
    DescentRegimeKind Regime,
    double VelocityMPerS,
    double IceTemperatureK,
    double MeltingTemperatureK,
    double PressurePa,
    double SensibleW,
    double LatentW,
    double LateralLossW,
    double WallSurplusW,
    bool WallPowerSufficient)
{
    /// <summary>Film heat plus the least wall heat that keeps the gap open along the body (<see cref="SideBalance"/>).</summary>
    public double RequiredSideHeatW { get; init; }

    /// <summary>Film heat plus the wall heat supplied.</summary>
    public double SideHeatSuppliedW { get; init; }

    /// <summary>Distance behind the head where refrozen water closes the gap (+∞ when it never does).</summary>
    public double RefreezeClosureM { get; init; } = double.PositiveInfinity;

    /// <summary>True when the gap closes within the body: a refreeze stall.</summary>
    public bool Held { get; init; }

    /// <summary>Mean water gap along the body, the clearance the probe steers with.</summary>
    public double ClearanceM { get; init; }
}
