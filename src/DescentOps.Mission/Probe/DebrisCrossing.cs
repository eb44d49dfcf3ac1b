using DescentOps.Scenarios.Model;

namespace DescentOps.Mission.Probe;

/// <summary>
/// What the head meets between two depths in the shell's debris bands: the depth of debris-laden ice it melted, the
/// debris it collects (h = φ dz / (1 − n_p), every released grain settling in the melt pocket as a deposit of porosity
/// n_p = 0.4, a rule of thumb from the physics reference, no published value), and the variance of the random tilt
/// change (σ² dz per band: a random walk in depth, MODEL: no published calibration exists).
/// </summary>
public readonly record struct DebrisCrossing(double BandDepthM, double DebrisM, double TiltVarianceRad2, IReadOnlyList<DebrisBandModel> BandsLeft)
{
    /// <summary>Porosity of the debris deposit on the head (rule of thumb, see the type's summary).</summary>
    public const double DepositPorosity = 0.4;

    public static DebrisCrossing Between(IReadOnlyList<DebrisBandModel> bands, double fromDepthM, double toDepthM)
    {
        double bandDepth = 0, debris = 0, variance = 0;
        var left = new List<DebrisBandModel>();
        foreach (var band in bands)
        {
            var overlap = Math.Min(toDepthM, band.BottomM) - Math.Max(fromDepthM, band.TopM);
            if (overlap <= 0) continue;
            bandDepth += overlap;
            debris += overlap * band.VolumeFraction / (1 - DepositPorosity);
            variance += band.TiltScatterRad * band.TiltScatterRad * overlap;
            if (fromDepthM < band.BottomM && toDepthM >= band.BottomM) left.Add(band);
        }

        return new DebrisCrossing(bandDepth, debris, variance, left);
    }
}
