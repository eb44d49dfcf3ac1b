using DescentOps.Physics.Descent;
using DescentOps.Physics.Refreezing;
using Xunit;

namespace DescentOps.Physics.Tests.Refreezing;

public class RefreezeTests
{
    [Theory]
    // Computed (CALC) in the reference note §5.1 (FRZ-1) from the Carslaw & Jaeger (1959, §11.2) equations;
    // tolerance 1e-6. The (a) value at Ste = 1 also matches the classic tabulated 0.6201 (from memory).
    [InlineData(0.01, 0.070593, 0.005606)]
    [InlineData(0.1, 0.220016, 0.053084)]
    [InlineData(0.2, 0.306424, 0.100376)]
    [InlineData(0.5, 0.464786, 0.216879)]
    [InlineData(1, 0.620063, 0.357835)]
    [InlineData(2, 0.800601, 0.541132)]
    [InlineData(5, 1.059687, 0.820418)]
    public void Front_constants(double ste, double onePhase, double coldWall)
    {
        Approx.Abs(onePhase, StefanProblem.OnePhaseFrontConstant(ste), 1e-6, "case (a)");
        Approx.Abs(coldWall, StefanProblem.ColdWallFrontConstant(ste), 1e-6, "case (b)");
    }

    [Fact]
    public void Small_Stefan_limits()
    {
        // Expansions of the two equations for Ste → 0: λ → √(Ste/2) and λ → Ste/√π (first order).
        Approx.Rel(Math.Sqrt(1e-6 / 2), StefanProblem.OnePhaseFrontConstant(1e-6), 1e-6, "(a)");
        Approx.Rel(1e-6 / Math.Sqrt(Math.PI), StefanProblem.ColdWallFrontConstant(1e-6), 1e-5, "(b)");
    }

    [Theory]
    // Computed (CALC), reference note FRZ-2, two-phase Neumann: ice k 2.3, ρ 917, c 2000; water k 0.5556, ρ 999.84,
    // c 4219.9; L 333.43 kJ/kg; wall 250 K. Tolerance 1e-6 on λ, 0.01 mm on s(1 h).
    [InlineData(273.15, 0.257701, 34.63)]
    [InlineData(274.15, 0.255266, 34.30)]
    [InlineData(277.15, 0.248243, 33.36)]
    public void Neumann_two_phase(double liquidK, double expectedLambda, double frontAfterHourMm)
    {
        const double kS = 2.3, rhoS = 917, cS = 2000, kL = 0.5556, rhoL = 999.84, cL = 4219.9, latent = 333430, tm = 273.15;
        var kappaS = kS / (rhoS * cS);
        var kappaL = kL / (rhoL * cL);
        var ste = cS * (tm - 250.0) / latent;
        var b = kL * (liquidK - tm) / (rhoS * latent * Math.Sqrt(kappaS * kappaL));
        var lambda = StefanProblem.TwoPhaseFrontConstant(ste, b, Math.Sqrt(kappaS / kappaL));
        Approx.Abs(expectedLambda, lambda, 1e-6, "lambda");
        Approx.Abs(frontAfterHourMm, 2 * lambda * Math.Sqrt(kappaS * 3600) * 1e3, 0.01, "s(1 h)");
    }

    [Fact]
    public void Planar_freeze_in_of_a_thin_gap()
    {
        // Reference note §5.2 (computed): for w = 0.1 mm at 250 K it quotes "0.351 s vs 0.354 s" for the cylinder
        // model at t_e = 0 and the planar case (b), without saying which is which. The cylinder must be the faster:
        // its wall flux exceeds the planar one by the curvature term (G ≈ 1/√(πτ) + ½), so 0.351 s is the cylinder.
        var planar = Refreeze.FreezeIn(1e-4, 250.0, 273.15);
        Approx.Abs(0.354, planar.FreezeTimeS, 0.0015, "planar");
        var cylinder = Refreeze.FreezeInAroundProbe(1e-4, 0.1, 0.0, 250.0, 273.15, stefanCorrected: false);
        Approx.Abs(0.351, cylinder.FreezeTimeS, 0.0015, "cylinder");
        Assert.True(cylinder.FreezeTimeS < planar.FreezeTimeS);
        Approx.Rel(46_569.0 / 333_420.0, planar.StefanNumber, 2e-4, "Ste = Δh_s/L");
    }

    [Theory]
    // Computed (CALC), reference note §5.2 (FRZ-3): R 0.1 m, a = 651 W/m, T_m 273.15 K; tolerance 1e-3 rel. These check
    // the note's uncorrected form; the model the runs use adds the Stefan factor (checked against the enthalpy solver).
    [InlineData(1e-3, 250.0, 0.0, 33.35)]
    [InlineData(1e-3, 250.0, 3600.0, 473.8)]
    [InlineData(1e-3, 100.0, 0.0, 0.552)]
    [InlineData(1e-3, 100.0, 3600.0, 51.66)]
    [InlineData(10e-3, 250.0, 3600.0, 5508.0)]
    [InlineData(10e-3, 100.0, 3600.0, 526.8)]
    public void Freeze_in_around_a_stopped_probe(double gapM, double iceK, double exposureS, double expectedS)
    {
        Approx.Rel(expectedS, Refreeze.FreezeInAroundProbe(gapM, 0.1, exposureS, iceK, 273.15, stefanCorrected: false).FreezeTimeS, 1e-3, "t_f");
        Assert.True(Refreeze.FreezeInAroundProbe(gapM, 0.1, exposureS, iceK, 273.15).FreezeTimeS >= expectedS * (1 - 1e-3), "the Stefan factor only slows freezing");
    }

    [Theory]
    // Computed (CALC), reference note §5.3 (FRZ-4), worked examples A and B of PRB-9; tolerance 2e-3 rel.
    [InlineData(250.0, 9.80665, 0.3271, 12.786)]
    [InlineData(100.0, 1.315, 0.0112, 0.2997)]
    public void Critical_refreezing_lengths(double farFieldK, double g, double onsetM, double closureM)
    {
        var probe = new ProbeGeometry(0.1, 2.5, 200.0);
        var descent = SteadyDescent.Solve(probe, 5000.0, 0.0, farFieldK, 101325.0, g);
        var lengths = Refreeze.CriticalLengths(probe, descent, farFieldK, 101325.0);
        Approx.Rel(onsetM, lengths.OnsetLengthM, 2e-3, "L_crit");
        Approx.Rel(closureM, lengths.ClosureLengthM, 2e-3, "z_c");
    }

    [Fact]
    public void Melting_free_takes_at_least_the_annulus_energy_and_less_time_with_more_power()
    {
        var weak = Refreeze.MeltFree(1e-3, 0.1, 2.5, 500.0, 3600.0, 250.0, 273.15);
        var strong = Refreeze.MeltFree(1e-3, 0.1, 2.5, 2000.0, 3600.0, 250.0, 273.15);
        var annulusJ = 2 * Math.PI * 0.1 * 2.5 * 1e-3 * 999.84 * 333_420.0;
        Assert.True(weak.EnergyJ > annulusJ && strong.EnergyJ > annulusJ);
        Assert.True(strong.TimeS < weak.TimeS);
        Assert.True(strong.EnergyJ < weak.EnergyJ); // less heat lost to the ice while melting faster
        Approx.Rel(weak.EnergyJ, 500.0 * weak.TimeS, 1e-12, "E = P t");
        // With no more than the stopped probe's steady loss (PRB-8: 3183.6 W at 100 K) it never melts free.
        Assert.True(double.IsPositiveInfinity(Refreeze.MeltFree(1e-3, 0.1, 2.5, 3000.0, 3600.0, 100.0, 273.15).TimeS));
        Assert.True(double.IsFinite(Refreeze.MeltFree(1e-3, 0.1, 2.5, 3500.0, 3600.0, 100.0, 273.15).TimeS));
    }

    [Fact]
    public void Refuses_bad_input()
    {
        var e = Assert.ThrowsAny<ArgumentOutOfRangeException>(() => Refreeze.FreezeIn(1e-3, 280.0, 273.15));
        Assert.Contains("iceTemperatureK", e.Message);
        Assert.ThrowsAny<ArgumentOutOfRangeException>(() => Refreeze.FreezeIn(-1e-3, 250.0, 273.15));
        Assert.ThrowsAny<ArgumentOutOfRangeException>(() => Refreeze.FreezeIn(1e-3, 250.0, 260.0));
        Assert.ThrowsAny<ArgumentOutOfRangeException>(() => StefanProblem.OnePhaseFrontConstant(-0.1));
        Assert.True(double.IsPositiveInfinity(Refreeze.FreezeIn(1e-3, 273.15, 273.15).FreezeTimeS));
    }
}
