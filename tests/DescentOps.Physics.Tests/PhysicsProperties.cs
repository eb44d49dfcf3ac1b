using DescentOps.Physics.Descent;
using DescentOps.Physics.Ice;
using DescentOps.Physics.Refreezing;
using FsCheck.Xunit;
using Xunit;

namespace DescentOps.Physics.Tests;

/// <summary>
/// Randomised properties. FsCheck draws unsigned 16-bit integers; each is mapped onto a physical range so that every
/// draw is a valid input (or, in the last property, a deliberately invalid one).
/// </summary>
public class PhysicsProperties
{
    private static double Map(ushort draw, double low, double high) => low + ((high - low) * draw / ushort.MaxValue);

    private static (ProbeGeometry Probe, double HeadW, double WallW, double FarFieldK, double PressurePa, double G) Case(ushort a, ushort b, ushort c, ushort d, ushort e, ushort f)
    {
        var radius = Map(a, 0.05, 0.25);
        var length = Map(b, 1.0, 5.0);
        var probe = new ProbeGeometry(radius, length, 3.0 * 999.84 * Math.PI * radius * radius * length);
        var pressure = Map(e, 2e3, 40e6);
        var farField = Map(c, 55.0, MeltingCurve.TemperatureK(pressure) - 0.5);
        return (probe, Map(d, 2000.0, 30000.0), Map(f, 0.0, 20000.0), farField, pressure, Map((ushort)(a ^ f), 0.1, 10.0));
    }

    [Property(MaxTest = 200)]
    public void Velocity_is_finite_non_negative_and_the_power_balances(ushort a, ushort b, ushort c, ushort d, ushort e, ushort f)
    {
        var x = Case(a, b, c, d, e, f);
        var s = SteadyDescent.Solve(x.Probe, x.HeadW, x.WallW, x.FarFieldK, x.PressurePa, x.G);
        Assert.True(double.IsFinite(s.VelocityMPerS) && s.VelocityMPerS >= 0);
        Assert.True(s.VelocityMPerS <= s.IdealVelocityMPerS * (1 + 1e-12));
        Assert.True(s.LateralLossW >= 0 && s.SensibleW >= 0 && s.LatentW >= 0 && s.WallSurplusW >= 0);
        Approx.Rel(x.HeadW + x.WallW, s.SensibleW + s.LatentW + s.LateralLossW + s.WallSurplusW, 1e-9, "balance");
    }

    [Property(MaxTest = 200)]
    public void More_power_means_faster_descent(ushort a, ushort b, ushort c, ushort d, ushort e, ushort f)
    {
        var x = Case(a, b, c, d, e, f);
        var slow = SteadyDescent.Solve(x.Probe, x.HeadW, x.WallW, x.FarFieldK, x.PressurePa, x.G);
        var fast = SteadyDescent.Solve(x.Probe, x.HeadW * 1.2, x.WallW, x.FarFieldK, x.PressurePa, x.G);
        Assert.True(fast.VelocityMPerS >= slow.VelocityMPerS);
        // A film already at the boiling point melts no faster with more power: the extra power boils water.
        if (!slow.Stalled && slow.BoilOffW == 0) Assert.True(fast.VelocityMPerS > slow.VelocityMPerS);
    }

    [Property(MaxTest = 300)]
    public void The_film_is_never_hotter_than_boiling_water_at_the_pressure(ushort a, ushort b, ushort c, ushort d, ushort e, ushort f)
    {
        // Issue 12: the film may not be superheated above the boiling point at the local pressure (IAPWS-IF97); what
        // the bound keeps from melting boils water and is still accounted for in the power balance.
        var x = Case(a, b, c, d, e, f);
        var s = SteadyDescent.Solve(x.Probe, x.HeadW * 3, x.WallW, x.FarFieldK, x.PressurePa, x.G);
        if (s.Stalled) return;
        var boilingK = DescentOps.Physics.Water.BoilingCurve.TemperatureK(x.PressurePa);
        Assert.True(MeltingCurve.TemperatureK(x.PressurePa) + s.HeadSuperheatK <= boilingK + 1e-9, $"{s.HeadSuperheatK} K over T_m at {x.PressurePa} Pa");
        Assert.True(s.BoilOffW >= 0 && s.BoilOffW <= s.HeadPowerW);
        Approx.Rel(s.HeadPowerW + s.WallPowerW, s.SensibleW + s.LatentW + s.LateralLossW + s.WallSurplusW, 1e-9, "balance");
    }

    [Property(MaxTest = 200)]
    public void Colder_ice_means_slower_descent(ushort a, ushort b, ushort c, ushort d, ushort e, ushort f)
    {
        var x = Case(a, b, c, d, e, f);
        var warm = SteadyDescent.Solve(x.Probe, x.HeadW, x.WallW, x.FarFieldK, x.PressurePa, x.G);
        var cold = SteadyDescent.Solve(x.Probe, x.HeadW, x.WallW, Math.Max(50.0, x.FarFieldK - 5.0), x.PressurePa, x.G);
        Assert.True(cold.VelocityMPerS <= warm.VelocityMPerS);
        if (!cold.Stalled) Assert.True(cold.VelocityMPerS < warm.VelocityMPerS);
        Assert.True(cold.LateralDemandW >= warm.LateralDemandW || cold.Stalled);
    }

    [Property(MaxTest = 200)]
    public void Refreeze_time_grows_with_gap_and_shrinks_in_colder_ice(ushort a, ushort b, ushort c)
    {
        var gap = Map(a, 1e-5, 0.05);
        var meltingK = Map(c, 270.0, 273.16);
        var iceK = Map(b, 60.0, meltingK - 1.0);
        var baseline = Refreeze.FreezeIn(gap, iceK, meltingK);
        Assert.True(double.IsFinite(baseline.FreezeTimeS) && baseline.FreezeTimeS > 0);
        Assert.True(Refreeze.FreezeIn(gap * 1.5, iceK, meltingK).FreezeTimeS > baseline.FreezeTimeS);
        Assert.True(Refreeze.FreezeIn(gap, Math.Max(50.0, iceK - 5.0), meltingK).FreezeTimeS < baseline.FreezeTimeS);
        var aroundProbe = Refreeze.FreezeInAroundProbe(gap, 0.1, 3600.0, iceK, meltingK).FreezeTimeS;
        Assert.True(Refreeze.FreezeInAroundProbe(gap * 1.5, 0.1, 3600.0, iceK, meltingK).FreezeTimeS > aroundProbe);
    }

    [Property(MaxTest = 100)]
    public void Out_of_range_input_gives_the_range_error(ushort a, ushort b)
    {
        var probe = new ProbeGeometry(0.1, 2.5, 200.0);
        var tooWarm = MeltingCurve.TemperatureK(101325.0) + Map(a, 0.01, 100.0);
        var tooCold = Map(b, -100.0, 49.9);
        Assert.Contains("valid range", Assert.ThrowsAny<ArgumentOutOfRangeException>(() => SteadyDescent.Solve(probe, 5000, 0, tooWarm, 101325.0, 9.8)).Message);
        Assert.Contains("valid range", Assert.ThrowsAny<ArgumentOutOfRangeException>(() => SteadyDescent.Solve(probe, 5000, 0, tooCold, 101325.0, 9.8)).Message);
        Assert.ThrowsAny<ArgumentOutOfRangeException>(() => IceIh.DensityKgPerM3(Map(a, -500.0, -1e-9), 1e5));
        Assert.ThrowsAny<ArgumentOutOfRangeException>(() => IceIh.DensityKgPerM3(200.0, Map(b, 210.001e6, 1e9)));
        Assert.ThrowsAny<ArgumentOutOfRangeException>(() => Refreeze.FreezeIn(-Map(a, 1e-9, 1.0), 250.0, 273.15));
    }
}
