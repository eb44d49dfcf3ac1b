using System.Collections.Immutable;
using DescentOps.Mission.Tether;
using DescentOps.Physics.Links;
using DescentOps.Scenarios.Model;

namespace DescentOps.Mission.Tests;

/// <summary>
/// The link's pure parts: the tether's optical budget against the physics model and the ITU-T G.652 limits, the
/// relays' range against the physics reference's check values and its fall with temperature, and the store-and-forward
/// chain's bookkeeping (nothing moved is ever dropped).
/// </summary>
public sealed class LinkModelTests
{
    private static TetherModel Tether(double lengthM, FibreOpticsModel optics) => new(lengthM, 2.04e8, optics);

    [Fact]
    public void The_tether_budget_is_the_physics_references_check_values_FO1_to_FO3()
    {
        // Physics reference (links-power-ocean.md §1.6), FO-1 (CALC): α = 0.30 dB/km over 20 km, 10 splices × 0.1 dB,
        // 2 connectors × 0.5 dB, 1.0 dB of bends: loss = 0.30·20 + 10·0.1 + 2·0.5 + 1.0 = 9.0 dB, the whole fibre paid out.
        var fo1 = new FibreOpticsModel("1000base-lx", 0.30, null, null, 10, 0.1, 2, 0.5, 1.0, 0.0, 0.0);
        var lx = new TetherOptics(Tether(20_000, fo1)).Budget(20_000);
        Assert.Equal(9.0, lx.TotalLossDb, 9);
        // FO-2: 1000BASE-LX, minimum launch −11 dBm, sensitivity −19 dBm: margin −11 − 9 + 19 = −1.0 dB, the link is down.
        Assert.Equal(-1.0, lx.MarginDb, 9);
        Assert.False(lx.LinkUp);
        // FO-3: long-reach optics, 0 dBm and −24 dBm: margin 0 − 9 + 24 = 15.0 dB.
        var longReach = new TetherOptics(Tether(20_000, fo1 with { Transceiver = "gbe-long-reach" })).Budget(20_000);
        Assert.Equal(15.0, longReach.MarginDb, 9);
        Assert.True(longReach.LinkUp);
    }

    [Fact]
    public void The_default_tether_closes_even_on_the_worst_fibre_G652D_allows()
    {
        // ITU-T G.652 (11/2016), table of G.652.D attributes: cabled attenuation at most 0.40 dB/km at 1310–1625 nm and
        // 0.30 dB/km at 1550 nm (as the physics reference's §1.2 quotes them). The defaults' typical 0.35 dB/km lies below.
        var defaults = new TetherOptics(Tether(3_200, FibreOpticsModel.Default));
        Assert.Equal(0.40, defaults.G652DMaximumDbPerKm);
        Assert.True(defaults.AttenuationDbPerKm <= defaults.G652DMaximumDbPerKm);
        Assert.True(new TetherOptics(Tether(3_200, FibreOpticsModel.Default with { Transceiver = "gbe-long-reach" })).AttenuationDbPerKm <= 0.30);

        // Computed: the demo's 3.2 km spool fully paid out, 1000BASE-LX, two connectors × 0.3 dB:
        // typical fibre −11 − (0.35·3.2 + 0.6) + 19 = 6.28 dB; the worst G.652.D fibre −11 − (0.40·3.2 + 0.6) + 19 = 6.12 dB.
        Assert.Equal(6.28, defaults.Budget(3_200).MarginDb, 9);
        var worst = new TetherOptics(Tether(3_200, FibreOpticsModel.Default with { AttenuationDbPerKm = 0.40 })).Budget(3_200);
        Assert.Equal(6.12, worst.MarginDb, 9);
        Assert.True(worst.LinkUp);
    }

    [Fact]
    public void Pack_loss_shrinks_with_the_share_of_fibre_still_wound()
    {
        var optics = FibreOpticsModel.Default with { PackLossDb = 2.0 };
        var tether = new TetherOptics(Tether(4_000, optics));
        // Computed: 2 dB of pack loss on a full spool; with 1 km of 4 km paid out, 3/4 of it is still wound: 1.5 dB.
        var start = tether.Budget(0);
        var quarter = tether.Budget(1_000);
        Assert.Equal(0.6 + 2.0, start.TotalLossDb, 9);
        Assert.Equal((0.35 * 1.0) + 0.6 + 1.5, quarter.TotalLossDb, 9);
        Assert.Equal(0.35 * 4.0 + 0.6, tether.Budget(4_000).TotalLossDb, 9);
    }

    private static RelayPlanModel Rf12Plan(double transmitPowerDbm = 30.0) =>
        new(1, null, [], transmitPowerDbm, 0.0, 100e6, 10e3, 5.0, 10.0, 6.0, 0.0, "m07-std", 1e6, 1.0, 0, 0.0);

    [Fact]
    public void The_relay_range_is_the_physics_references_check_value_RF12_at_the_temperatures_of_RF2_and_RF4()
    {
        // Physics reference §2.4, RF-12 (CALC): 30 dBm, 0 dBi, 10 kHz, NF 5 dB, SNR 10 dB, margin 6 dB, no misc loss,
        // 100 MHz: allowed path loss 143.0 dB; spacing 7.92 km at N_a = 6 dB/km and 1.69 km at 36 dB/km (1 % rel).
        // RF-2 and RF-4 give those rates for pure ice (M07-std) at 251 K (6.036 dB/km) and 270 K (36.13 dB/km).
        var cold = new RelayRadio(Rf12Plan(), _ => 251.0);
        var warm = new RelayRadio(Rf12Plan(), _ => 270.0);
        Assert.Equal(143.0, IceRadioLinkBudget.AllowedPathLossDb(cold.Link), 1);
        Assert.Equal(6.036, cold.AttenuationDbPerM(100) * 1e3, 3);
        Assert.Equal(36.13, warm.AttenuationDbPerM(100) * 1e3, 2);
        Assert.InRange(cold.RangeM(100), 7920 * 0.99, 7920 * 1.01);
        Assert.InRange(warm.RangeM(100), 1690 * 0.99, 1690 * 1.01);
    }

    [Fact]
    public void A_hop_closes_exactly_within_the_range()
    {
        var radio = new RelayRadio(Rf12Plan(-25.0), z => 132.0 * Math.Pow(272.0 / 132.0, z / 2500.0));
        foreach (var depth in new[] { 600.0, 1500.0, 2300.0, 2490.0 })
        {
            var range = radio.RangeM(depth);
            Assert.True(radio.HopMarginDb(depth - (range * 0.999), depth) >= 0.0, $"at {depth} m");
            Assert.True(radio.HopMarginDb(depth - (range * 1.001), depth) < 0.0, $"at {depth} m");
        }
    }

    [Fact]
    public void Range_falls_as_the_ice_warms()
    {
        // Property over 300 random radios and temperature pairs (seeded, so every run draws the same cases).
        var random = new Random(20261202);
        for (var n = 0; n < 300; n++)
        {
            var plan = Rf12Plan(-40 + (random.NextDouble() * 70)) with { FrequencyHz = 1e6 + (random.NextDouble() * 9.99e8), MiscLossDb = random.NextDouble() * 10 };
            var t1 = 120 + (random.NextDouble() * 150);
            var t2 = t1 + (random.NextDouble() * (273.15 - t1));
            var colder = new RelayRadio(plan, _ => t1).RangeM(10);
            var warmer = new RelayRadio(plan, _ => t2).RangeM(10);
            Assert.True(warmer <= colder, $"case {n}: {t1} K gives {colder} m, {t2} K gives {warmer} m");
        }
    }

    [Fact]
    public void Settling_moves_items_in_order_and_loses_none()
    {
        // Property over 2000 random chains: every item is either still held or delivered exactly once; no hold exceeds
        // its capacity; an item moves only across closed hops; a closed run of hops to the surface empties; CanLeave
        // predicts whether a newcomer at the probe end gets away.
        var random = new Random(7);
        for (var n = 0; n < 2000; n++)
        {
            var nodes = 1 + random.Next(6);
            var next = 0;
            var holds = new List<FrameHold<int>>();
            for (var i = 0; i < nodes; i++)
            {
                var capacity = random.Next(5);
                var hold = new FrameHold<int>(capacity);
                var count = random.Next(capacity + 1);
                for (var k = 0; k < count; k++) hold = hold.Offer(next++)!;
                holds.Add(hold);
            }

            var closes = Enumerable.Range(0, nodes).Select(_ => random.Next(3) > 0).ToList();
            var settled = StoreAndForward.Settle(holds, closes);

            var held = settled.Holds.SelectMany(h => h.Items).ToList();
            var delivered = settled.Delivered.Select(d => d.Item).ToList();
            Assert.Equal(Enumerable.Range(0, next).ToHashSet(), held.Concat(delivered).ToHashSet());
            Assert.Equal(next, held.Count + delivered.Count);
            for (var i = 0; i < nodes; i++)
            {
                Assert.True(settled.Holds[i].Count <= settled.Holds[i].Capacity);
                Assert.Equal(settled.Holds[i].Count, settled.Holds[i].Items.Count());
            }

            foreach (var (item, from) in settled.Delivered)
            {
                Assert.True(Enumerable.Range(from, nodes - from).All(h => closes[h]), $"case {n}: item {item} crossed an open hop");
            }

            // An item joining the probe end's tail leaves it in this settle exactly when CanLeave says so.
            var newcomer = -1;
            var withNewcomer = holds.ToList();
            withNewcomer[0] = (holds[0] with { Capacity = holds[0].Capacity + 1 }).Offer(newcomer)!;
            var stays = StoreAndForward.Settle(withNewcomer, closes).Holds[0].Items.Contains(newcomer);
            Assert.Equal(!stays, StoreAndForward.CanLeave(holds, closes, 0));

            // Above the highest open hop, every hop closes up to the surface: those nodes must have emptied.
            var clearFrom = closes.LastIndexOf(false) + 1;
            Assert.All(settled.Holds.Skip(clearFrom), h => Assert.Equal(0, h.Count));
        }
    }

    [Fact]
    public void A_full_hold_refuses_and_says_so()
    {
        var hold = new FrameHold<int>(2).Offer(1)!.Offer(2)!;
        Assert.Null(hold.Offer(3));
        Assert.Equal(1.0, hold.Fill);
        Assert.Equal([1, 2], hold.Items.ToArray());
        Assert.Equal(0.0, new FrameHold<int>(0).Fill);
        Assert.Equal(ImmutableQueue<int>.Empty, hold.Cleared().Items);
    }
}
