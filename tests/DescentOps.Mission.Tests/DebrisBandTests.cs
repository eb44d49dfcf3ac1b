using DescentOps.Mission.Probe;
using DescentOps.Scenarios.Model;

namespace DescentOps.Mission.Tests;

/// <summary>Debris bands: the deposit the head collects and the random tilt they give, as a walk in depth.</summary>
public sealed class DebrisBandTests
{
    [Fact]
    public void A_crossing_counts_only_the_overlap_with_each_band()
    {
        DebrisBandModel[] bands = [new(100, 110, 0.003, 0.01), new(200, 240, 0.0005, 0.02)];

        var crossing = DebrisCrossing.Between(bands, 105, 220);

        // Computed: 5 m of the first band and 20 m of the second; deposit φ dz / (1 − 0.4); variance σ² dz.
        Assert.Equal(25, crossing.BandDepthM, 12);
        Assert.Equal(((5 * 0.003) + (20 * 0.0005)) / 0.6, crossing.DebrisM, 12);
        Assert.Equal((0.01 * 0.01 * 5) + (0.02 * 0.02 * 20), crossing.TiltVarianceRad2, 12);
        Assert.Equal([bands[0]], crossing.BandsLeft);
        Assert.Equal(bands, DebrisCrossing.Between(bands, 0, 300).BandsLeft);
        Assert.Equal(0, DebrisCrossing.Between(bands, 110, 200).BandDepthM);
    }

    private static Scenario WithBand(string scatter) => MissionHarness.Edited(
        ("  ocean_salinity: 12 g/kg", $"  ocean_salinity: 12 g/kg\n  debris_bands:\n    - {{ top: 600 m, bottom: 640 m, volume_fraction: 0.003, tilt_scatter: {scatter} }}"),
        ("until: 400 d", "until: 40 d"));

    [Fact]
    public async Task The_head_collects_the_bands_debris_and_the_band_scatters_its_tilt()
    {
        var (_, calm) = await MissionHarness.RunAsync(WithBand("0 deg"));
        var (_, rough) = await MissionHarness.RunAsync(WithBand("0.2 deg"));
        var (_, again) = await MissionHarness.RunAsync(WithBand("0.2 deg"));

        // Computed: 40 m of ice with 0.3 % debris by volume leaves 40 × 0.003 / (1 − 0.4) = 0.2 m on the head.
        var crossed = Assert.Single(rough.OfKind("probe.debris_band_crossed"));
        Assert.Equal(0.2, CollectingSink.Field(crossed, "debris_on_head_m"), 3);

        static double[] Tilts(CollectingSink sink) => [.. sink.OfKind("probe.telemetry").Select(r => CollectingSink.Field(r, "tilt_rad"))];
        static double[] Depths(CollectingSink sink) => [.. sink.OfKind("probe.telemetry").Select(r => CollectingSink.Field(r, "depth_m"))];

        Assert.All(Tilts(calm), t => Assert.Equal(0.0, t));
        var roughTilts = Tilts(rough);
        var roughDepths = Depths(rough);
        // Above the band nothing scatters; inside it the tilt wanders; the same seed wanders the same way.
        Assert.All(roughTilts.Zip(roughDepths).Where(x => x.Second < 600), x => Assert.Equal(0.0, x.First));
        Assert.Contains(roughTilts.Zip(roughDepths), x => x.Second is > 600 and < 640 && x.First != 0.0);
        Assert.Equal(roughTilts, Tilts(again));
    }
}
