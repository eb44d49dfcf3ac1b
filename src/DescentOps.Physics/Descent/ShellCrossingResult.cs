namespace DescentOps.Physics.Descent;

/// <summary>
/// Time for a probe to cross its shell at constant power, and how that time splits between regimes.
/// When the probe stalls on the way, <see cref="TimeS"/> is +∞ and <see cref="StallDepthM"/> says where.
/// </summary>
/// <param name="TimeS">Surface to base, s (+∞ when stalled).</param>
/// <param name="RegimeTimesS">Seconds spent in each regime on the way (the stalled regime never appears).</param>
/// <param name="StallDepthM">Depth of the first stall, or null when the probe reaches the base.</param>
public sealed record ShellCrossingResult(double TimeS, IReadOnlyDictionary<DescentRegimeKind, double> RegimeTimesS, double? StallDepthM);
