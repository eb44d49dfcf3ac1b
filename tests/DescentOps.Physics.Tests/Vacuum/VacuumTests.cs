using DescentOps.Physics.Vacuum;
using Xunit;

namespace DescentOps.Physics.Tests.Vacuum;

public class VacuumTests
{
    [Theory]
    // Computed (CALC) in the reference note §6.1 (VAC-1): α_s 1, p_v 0; tolerance 1e-4 rel.
    [InlineData(273.16, 0.68725)]
    [InlineData(260.0, 0.22550)]
    [InlineData(220.0, 3.3229e-3)]
    [InlineData(200.0, 2.1352e-4)]
    [InlineData(150.0, 9.2426e-9)]
    public void Hertz_Knudsen_flux(double t, double expected)
    {
        Approx.Rel(expected, VacuumSublimation.MassFluxKgPerM2S(t), 1e-4, "J");
    }

    [Theory]
    // Computed (CALC) in the reference note §6.2 (VAC-2): q_h = 5 kW/(π 0.1²); tolerance 0.01 K on T_s; speeds are
    // printed to 4 digits, so 1e-3 rel.
    [InlineData(100.0, 1.0, 244.59, 0.2021)]
    [InlineData(100.0, 0.1, 269.65, 0.1991)]
    [InlineData(250.0, 1.0, 245.30, 0.2201)]
    [InlineData(250.0, 0.1, 270.50, 0.2166)]
    public void Head_surface_temperature_in_vacuum(double farFieldK, double alpha, double surfaceK, double mPerH)
    {
        var s = VacuumSublimation.SolveHead(5000.0 / (Math.PI * 0.01), farFieldK, alpha);
        Approx.Abs(surfaceK, s.SurfaceTemperatureK, 0.01, "T_s");
        Approx.Rel(mPerH, s.VelocityMPerS * 3600, 1e-3, "v");
        Approx.Rel(5000.0 / (Math.PI * 0.01), s.MassFluxKgPerM2S * s.EnergyPerKgJ, 1e-6, "flux balance");
    }

    [Fact]
    public void Energy_per_kilogram_from_cold_ice()
    {
        // Reference note VAC-2 (computed): Δh_vac = 3.038 MJ/kg for T∞ 100 K, α_s 1. (Its "5.10× the melting budget"
        // remark could not be reproduced from the stated inputs — we get 5.15 against 256.401 + 333.43 kJ/kg — and is
        // not tested.)
        var s = VacuumSublimation.SolveHead(5000.0 / (Math.PI * 0.01), 100.0);
        Approx.Abs(3.038e6, s.EnergyPerKgJ, 0.0005e6, "Δh_vac");
    }

    [Theory]
    // Computed (CALC), reference note §6.3 (VAC-3): ρ_i 930; tolerance 1e-3 m.
    [InlineData(1.315, 0.5001)]
    [InlineData(0.113, 5.8203)]
    [InlineData(1.428, 0.4606)]
    [InlineData(3.71, 0.1773)]
    [InlineData(9.80665, 0.0671)]
    public void Overburden_for_liquid(double g, double expectedM)
    {
        Approx.Abs(expectedM, LiquidOnset.MinimumLiquidDepthM(930.0, g), 1e-3, "z_liq");
    }

    [Fact]
    public void Melting_needs_a_sealed_deep_enough_hole()
    {
        Approx.Abs(2.9, LiquidOnset.SealDepthM(2.5, 0.1), 1e-12, "z_seal = ℓ + 2·2R");
        Assert.False(LiquidOnset.MeltingPossible(2.0, 2.5, 0.1, 930.0, 1.315));
        Assert.True(LiquidOnset.MeltingPossible(3.0, 2.5, 0.1, 930.0, 1.315));
        Assert.False(LiquidOnset.MeltingPossible(5.0, 2.5, 0.1, 930.0, 0.113)); // needs 5.82 m of overburden
    }

    [Fact]
    public void Refuses_fluxes_outside_the_regime()
    {
        var e = Assert.ThrowsAny<ArgumentOutOfRangeException>(() => VacuumSublimation.SolveHead(1e7, 100.0));
        Assert.Contains("headFluxWPerM2", e.Message);
        Assert.ThrowsAny<ArgumentOutOfRangeException>(() => VacuumSublimation.MassFluxKgPerM2S(40.0));
        Assert.ThrowsAny<ArgumentOutOfRangeException>(() => VacuumSublimation.MassFluxKgPerM2S(200.0, 1.5));
    }
}
