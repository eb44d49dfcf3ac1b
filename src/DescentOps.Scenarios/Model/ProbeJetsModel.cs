namespace DescentOps.Scenarios.Model;

/// <summary>
/// The probe's hot-water jets: the most heat they can put into the water (<see cref="MaxHeatW"/>, the ceiling of a
/// telecommand), the pump's electric draw while they run, the smallest hole they may cut and the hole they cut when
/// the run starts, the share of their heat that melts ice, and the heat set at the start (0: off).
/// </summary>
public sealed record ProbeJetsModel(
    double MaxHeatW,
    double PumpPowerW,
    double MinimumHoleRadiusM,
    double HoleRadiusM,
    double Efficiency,
    double InitialHeatW)
{
    /// <summary>Widest hole a telecommand may ask for: 2 m, the plausibility bound of the probe's own radius.</summary>
    public const double MaxHoleRadiusM = 2.0;
}
