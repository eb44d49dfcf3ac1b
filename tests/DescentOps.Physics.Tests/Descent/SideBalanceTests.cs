using DescentOps.Physics.Descent;
using DescentOps.Physics.Refreezing;
using DescentOps.Physics.Water;
using Xunit;

namespace DescentOps.Physics.Tests.Descent;

/// <summary>The side balance, the boiling bound on the film and melting free, on the reference note's probe (R 0.1 m, ℓ 2.5 m, 200 kg).</summary>
public class SideBalanceTests
{
    private static readonly ProbeGeometry Probe = new(0.1, 2.5, 200.0);

    [Fact]
    public void Without_wall_heat_in_100_K_ice_the_probe_freezes_in_and_says_where()
    {
        var s = SteadyDescent.Solve(Probe, 5000.0, 0.0, 100.0, 1e6, 1.315);
        Assert.True(s.Side!.Held);
        // Where: within the body, and behind Aamot's critical length where the film's heat alone is used up
        // (computed here from the model's own lateral loss with no design gap).
        Assert.InRange(s.Side.RefreezeClosureM, 1e-4, Probe.LengthM);
        Assert.True(s.Side.SideHeatSuppliedW < s.Side.RequiredSideHeatW);
        var aamot = SteadyDescent.Solve(Probe, 5000.0, 0.0, 100.0, 1e6, 1.315, null, 0.0).Side!;
        Assert.True(aamot.RefreezeClosureM < s.Side.RefreezeClosureM, "a design gap lets the water run further before it closes");
    }

    [Fact]
    public void With_enough_wall_heat_the_same_probe_does_not_freeze_in()
    {
        var bare = SteadyDescent.Solve(Probe, 5000.0, 0.0, 100.0, 1e6, 1.315).Side!;
        var s = SteadyDescent.Solve(Probe, 5000.0, bare.RequiredSideHeatW, 100.0, 1e6, 1.315);
        Assert.False(s.Side!.Held);
        Assert.True(s.Side.ClearanceM > SteadyDescent.DefaultDesignGapM, "surplus wall heat widens the gap");
        // Reference note PRB-9 B (CALC): holding the whole 2.5 m wall at T_m takes 11452 W; the zoned heaters need that
        // less the film's share and the design gap's, so the requirement sits just below it.
        Assert.InRange(s.Side.RequiredSideHeatW, 0.9 * 11452.0, 11452.0 * 1.01);
    }

    [Fact]
    public void The_film_never_exceeds_boiling_and_the_heat_goes_somewhere()
    {
        // The case of issue 12: a 2.5 cm probe at 6 kW in 253.15 K ice at one atmosphere had a 392 K superheat.
        var s = SteadyDescent.Solve(new ProbeGeometry(0.025, 1.2, 2000.0 * Math.PI * 0.025 * 0.025 * 1.2), 6000.0, 0.0, 253.15, 101325.0, 9.80665);
        Assert.True(s.HeadSuperheatK <= BoilingCurve.TemperatureK(101325.0) - 273.15252 + 1e-6);
        Assert.True(s.BoilOffW > 0);
        Approx.Rel(s.HeadPowerW + s.WallPowerW, s.SensibleW + s.LatentW + s.LateralLossW + s.WallSurplusW, 1e-9, "power balance with boil-off");
    }

    [Theory]
    // IAPWS-IF97 (R7-97(2012)) Table 35 check values for the region-4 backward equation (from memory, and reproduced
    // by the python iapws package's IF97 where installed): T_s(0.1 MPa) = 372.755919 K, T_s(1 MPa) = 453.035632 K,
    // T_s(10 MPa) = 584.149488 K.
    [InlineData(0.1e6, 372.755919)]
    [InlineData(1e6, 453.035632)]
    [InlineData(10e6, 584.149488)]
    public void Boiling_curve_check_values(double pressurePa, double expectedK) =>
        Approx.Abs(expectedK, BoilingCurve.TemperatureK(pressurePa), 1e-6, "T_s");

    [Fact]
    public void A_held_probe_melts_free_and_a_longer_hold_takes_longer()
    {
        // 250 K ice, 0.5 mm gap, exposure ℓ/(2v) of a probe at about 1 m/h, head and wall together 9 kW.
        double Time(double heldS) => Refreeze.MeltFree(0.5e-3, 0.12, 2.4, 9000.0, 4300.0, 250.0, 273.15, heldS).TimeS;
        var hour = Time(3600.0);
        var day = Time(86400.0);
        var month = Time(30 * 86400.0);
        Assert.True(double.IsFinite(hour));
        // The cooling to put back grows with the hold until it equals the heat stored before it (then it stays).
        Assert.True(hour < day && day <= month, $"{hour} < {day} <= {month}");
        // Too little heat never frees it, and says how much the held body needs.
        var weak = Refreeze.MeltFree(0.5e-3, 0.12, 2.4, 100.0, 4300.0, 100.0, 273.15, 3600.0);
        Assert.True(double.IsPositiveInfinity(weak.TimeS));
        Assert.True(weak.HoldOpenPowerW > 100.0);
    }
}
