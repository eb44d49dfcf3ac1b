namespace DescentOps.Physics.Descent;

/// <summary>
/// Steady descent of a melt probe and where its power goes. The sinks add up to the power in:
/// <c>SensibleW + LatentW + LateralLossW + WallSurplusW = HeadPowerW + WallPowerW</c> (to 1e-9 relative, the
/// convergence of the head's fixed point). The film heat <see cref="FilmSuperheatW"/> (superheat and boiled-off vapour)
/// is not a separate sink: the meltwater carries it from the head to the wall, where it pays part of the lateral loss.
/// </summary>
/// <param name="VelocityMPerS">Descent speed (0 when stalled).</param>
/// <param name="SensibleW">Power warming the ice melted at the head from T∞ to T_m.</param>
/// <param name="LatentW">Power melting that ice.</param>
/// <param name="LateralLossW">Conduction into the ice through the side wall (all the power when stalled).</param>
/// <param name="HeadPowerW">Head power in.</param>
/// <param name="WallPowerW">Side-wall heater power in.</param>
/// <param name="FilmThicknessM">Melt-film thickness under the head (0 when stalled).</param>
/// <param name="WallPowerSufficient">Whether wall heaters and film water together hold the whole wall at T_m, i.e. the probe does not freeze in.</param>
public sealed record DescentSolution(
    double VelocityMPerS,
    double SensibleW,
    double LatentW,
    double LateralLossW,
    double HeadPowerW,
    double WallPowerW,
    double FilmThicknessM,
    bool WallPowerSufficient)
{
    /// <summary>Superheat of the film water leaving the head, ṁ f c_w ΔT_f; it flows to the wall.</summary>
    public double FilmSuperheatW { get; init; }

    /// <summary>Wall heat beyond what the wall loses: it widens the hole and warms the water column (MODEL).</summary>
    public double WallSurplusW { get; init; }

    /// <summary>Lateral loss needed to hold the whole wall at T_m (equal to <see cref="LateralLossW"/> when sufficient).</summary>
    public double LateralDemandW { get; init; }

    /// <summary>Wall heater power needed so that the probe does not freeze in: max(0, demand − film superheat).</summary>
    public double RequiredWallPowerW { get; init; }

    /// <summary>Head temperature above the melting point (film superheat ΔT_f).</summary>
    public double HeadSuperheatK { get; init; }

    /// <summary>Ideal speed v0 with all head power melting ice ahead.</summary>
    public double IdealVelocityMPerS { get; init; }

    /// <summary>True when the total power cannot hold the probe's surface at T_m (Lorenz-type stall).</summary>
    public bool Stalled { get; init; }

    /// <summary>Boiling point of water at the pressure; the film is never hotter (IAPWS-IF97).</summary>
    public double BoilingTemperatureK { get; init; }

    /// <summary>Head power boiling film water because the film is at the boiling point; it reaches the side as vapour.</summary>
    public double BoilOffW { get; init; }

    /// <summary>Head power the body carries to its wall instead of melting ahead (only for bodies heated by the head).</summary>
    public double BodyShareW { get; init; }

    /// <summary>The side balance: required and supplied side heat, refreeze closure, held, clearance (null when stalled).</summary>
    public SideBalanceSolution? Side { get; init; }

    /// <summary>Useful power ṁ (L + Δh_s) over head power (Baader et al. 2023 head efficiency).</summary>
    public double HeadEfficiency => HeadPowerW > 0 ? (SensibleW + LatentW) / HeadPowerW : 0.0;

    /// <summary>Useful power over all power in (Baader et al. 2023 probe efficiency).</summary>
    public double ProbeEfficiency => HeadPowerW + WallPowerW > 0 ? (SensibleW + LatentW) / (HeadPowerW + WallPowerW) : 0.0;
}
