using DescentOps.Physics.Radiation;
using Xunit;

namespace DescentOps.Physics.Tests.Radiation;

public class RadiationTests
{
    private const double Krad = 10.0; // Gy

    [Fact]
    public void Silicon_to_water()
    {
        // RD-1 CALC: Z/A of Si over Z/A of water.
        Approx.Abs(0.8980, DoseAccumulation.SiliconPerWaterDoseRatio, 1e-4, "RD-1");
        Assert.Equal(15.0, DoseAccumulation.AccumulatedDoseGy(10.0, 1e-3, 5000.0));
    }

    [Fact]
    public void Failure_distributions()
    {
        // RD-2, RD-3 CALC (reference note).
        Approx.Abs(0.11750, DoseToFailure.WeibullFailureProbability(50 * Krad, 100 * Krad, 3.0), 1e-5, "W 50");
        Approx.Abs(0.63212, DoseToFailure.WeibullFailureProbability(100 * Krad, 100 * Krad, 3.0), 1e-5, "W 100");
        Approx.Abs(0.08283, DoseToFailure.LognormalFailureProbability(50 * Krad, 100 * Krad, 0.5), 1e-5, "LN 50");
        Approx.Abs(0.79130, DoseToFailure.LognormalFailureProbability(150 * Krad, 100 * Krad, 0.5), 1e-5, "LN 150");
    }

    [Theory]
    [InlineData(0.05)]
    [InlineData(0.5)]
    [InlineData(0.95)]
    public void Sampled_doses_invert_the_distributions(double u)
    {
        // A unit whose draw is u fails where the CDF reaches 1 − u (Weibull, from −ln u) or Φ(z) (lognormal).
        var weibull = DoseToFailure.WeibullFailureDoseGy(u, 300 * Krad * 2, 3.0);
        Approx.Abs(1.0 - u, DoseToFailure.WeibullFailureProbability(weibull, 300 * Krad * 2, 3.0), 1e-12, "Weibull");
        var z = MathNet.Numerics.Distributions.Normal.InvCDF(0.0, 1.0, u);
        var lognormal = DoseToFailure.LognormalFailureDoseGy(z, 600 * Krad, 0.5);
        Approx.Abs(u, DoseToFailure.LognormalFailureProbability(lognormal, 600 * Krad, 0.5), 1e-9, "lognormal");
    }

    [Fact]
    public void Median_life()
    {
        // η(ln 2)^(1/β) is where F = 1/2; at 1 krad/day a 100 krad-η, β 3 part has a median life of 88.5 days (computed:
        // 100·0.693147^(1/3) = 88.50).
        var median = DoseToFailure.WeibullMedianDoseGy(100 * Krad, 3.0);
        Approx.Abs(0.5, DoseToFailure.WeibullFailureProbability(median, 100 * Krad, 3.0), 1e-12, "F(median)");
        Approx.Abs(88.50, DoseToFailure.MedianLifeS(median, Krad / 86400.0) / 86400.0, 0.01, "days");
    }

    [Fact]
    public void Shielding_rule_of_thumb()
    {
        // RD-4 CALC from μ/ρ(water) 0.0707 and 0.0222 cm²/g at 1 and 10 MeV (NIST XCOM, from memory), ρ_i 0.92 g/cm³.
        Approx.Abs(15.37e-2, IceShielding.PhotonAttenuationLengthM(0.0707e-1, 920.0), 1e-4, "1 MeV");
        Approx.Abs(48.96e-2, IceShielding.PhotonAttenuationLengthM(0.0222e-1, 920.0), 1e-4, "10 MeV");
        // One photon length down the photon part has fallen by e and the electron part (3 cm) is gone.
        var rate = IceShielding.DoseRateGyPerS(0.4896, 1.0, 0.03, 0.1, 0.4896);
        Approx.Rel((1.0 * Math.Exp(-0.4896 / 0.03)) + (0.1 / Math.E), rate, 1e-12, "two exponentials");
        Assert.ThrowsAny<ArgumentOutOfRangeException>(() => IceShielding.DoseRateGyPerS(-1.0, 1.0, 0.03, 0.1, 0.5));
    }

    [Fact]
    public void Bioburden_reduction_check_values()
    {
        // Computed: 3 h at a D-value of 30 min is 6 decades; 1e5 spores leave 0.1.
        Approx.Abs(6.0, BioburdenReduction.LogReductionFromHeat(3 * 3600.0, 1800.0), 1e-12, "heat");
        Approx.Abs(0.1, BioburdenReduction.SurvivingPopulation(1e5, 6.0), 1e-12, "survivors");
        Approx.Abs(2.5, BioburdenReduction.LogReductionFromDose(5e3, 2e3), 1e-12, "dose");
        Assert.ThrowsAny<ArgumentOutOfRangeException>(() => BioburdenReduction.LogReductionFromHeat(10.0, 0.0));
    }
}
