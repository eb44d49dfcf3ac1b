using DescentOps.Physics.Descent;
using DescentOps.Physics.Ice;
using DescentOps.Physics.Shell;
using Xunit;

namespace DescentOps.Physics.Tests.Descent;

/// <summary>Salty layers lower the melting point the head must reach; an open-fractured top delays liquid melting.</summary>
public class SaltAndFractureTests
{
    private const double NormalPressurePa = 101325.0;
    private static readonly ProbeGeometry Probe = new(0.12, 2.4, 210.0);

    [Fact]
    public void Salty_ice_needs_less_sensible_heat_so_the_probe_is_faster()
    {
        // Ice of 10 g/kg melts lower by the UNESCO (1983) salt term (Fofonoff and Millard 1983, UNESCO Tech. Pap. Mar.
        // Sci. 44, freezing point), about 0.54 K: computed below from the same formula, so this checks the wiring.
        var pureK = MeltingCurve.TemperatureK(NormalPressurePa);
        var saltyK = SalineIce.MeltingTemperatureK(10.0, NormalPressurePa);
        Assert.InRange(pureK - saltyK, 0.50, 0.60);

        var pure = SteadyDescent.Solve(Probe, 5000, 2000, 200, NormalPressurePa, 1.0);
        var salty = SteadyDescent.Solve(Probe, 5000, 2000, 200, NormalPressurePa, 1.0, saltyK);

        Assert.True(salty.VelocityMPerS > pure.VelocityMPerS);
        // Computed: the sensible heat per kilogram of melted ice falls by the heat to warm it from T_m,salty to T_m,pure;
        // the sensible power is that heat times the mass rate ρ π R² v.
        var area = Math.PI * Probe.RadiusM * Probe.RadiusM;
        var density = IceIh.DensityKgPerM3(200, NormalPressurePa);
        var perKgSalty = salty.SensibleW / (density * area * salty.VelocityMPerS);
        var perKgPure = pure.SensibleW / (density * area * pure.VelocityMPerS);
        Assert.Equal(IceIh.SensibleHeatJPerKg(200, saltyK, NormalPressurePa), perKgSalty, 6);
        Assert.Equal(IceIh.SensibleHeatJPerKg(200, pureK, NormalPressurePa), perKgPure, 6);
        // And the power still balances (DescentSolution's own invariant).
        Assert.Equal(7000, salty.SensibleW + salty.LatentW + salty.LateralLossW + salty.WallSurplusW, 6);
    }

    [Fact]
    public void A_melting_point_above_pure_ice_or_far_below_it_is_refused_by_name()
    {
        var pureK = MeltingCurve.TemperatureK(NormalPressurePa);
        var above = Assert.ThrowsAny<ArgumentOutOfRangeException>(() => SteadyDescent.Solve(Probe, 5000, 2000, 200, NormalPressurePa, 1.0, pureK + 0.1));
        Assert.Contains("meltingTemperatureK", above.Message, StringComparison.Ordinal);
        Assert.ThrowsAny<ArgumentOutOfRangeException>(() => SteadyDescent.Solve(Probe, 5000, 2000, 200, NormalPressurePa, 1.0, pureK - 5));
    }

    [Fact]
    public void A_fractured_top_holds_off_liquid_melting_to_its_bottom()
    {
        // Rule of the model (ours, no published value): liquid needs a sealed pocket, and open fractures do not seal.
        var plain = new ProbeDescentModel(new IceShell(110, 3000, 1.3), Probe);
        var fractured = new ProbeDescentModel(new IceShell(110, 3000, 1.3, fracturedToDepthM: 60), Probe);

        Assert.True(plain.LiquidOnsetDepthM < 60, "the seal depth of a 2.4 m probe lies well above 60 m");
        Assert.Equal(60, fractured.LiquidOnsetDepthM, 12);
        Assert.Equal(DescentRegimeKind.Sublimating, fractured.Rate(59, 5000, 2000).Regime);
        Assert.Equal(DescentRegimeKind.Melting, fractured.Rate(61, 5000, 2000).Regime);
    }
}
