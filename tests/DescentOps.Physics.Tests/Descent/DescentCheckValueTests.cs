using DescentOps.Physics.Descent;
using DescentOps.Physics.Ice;
using Xunit;

namespace DescentOps.Physics.Tests.Descent;

public class DescentCheckValueTests
{
    private const double NormalPressurePa = 101325.0;
    private static readonly ProbeGeometry Probe = new(0.1, 2.5, 200.0);

    [Theory]
    // Computed (CALC) in the reference note §4.1 (PRB-1): specific melt volume 1/(ρ_i (L + Δh_s)), 11.78 and 10.47
    // cm³/(W h) at 273.15 K and 253.15 K (tolerance 0.01); it matches the "~10.5–11.8 cm³/(W h)" ideal bound quoted by
    // Heinen et al. (2020), Ann. Glaciol., "An efficient melting probe for glacial research" (published).
    [InlineData(273.15, 11.78)]
    [InlineData(253.15, 10.47)]
    public void Specific_melt_volume(double farFieldK, double expectedCm3PerWh)
    {
        // v·A per watt is volume per joule; ×3600 s/h ×1e6 cm³/m³.
        var v = IdealMeltRate.VelocityMPerS(1.0, 1.0, farFieldK, 273.15, 1.0);
        Approx.Abs(expectedCm3PerWh, v * Math.PI * 3600 * 1e6, 0.01, "V_spec");
    }

    [Theory]
    // Computed (CALC), reference note PRB-2..4: P_h 5 kW, tolerance 1e-4 rel.
    [InlineData(0.1, 250.0, 1.63891)]
    [InlineData(0.1, 100.0, 1.04110)]
    [InlineData(0.25, 250.0, 0.26223)]
    [InlineData(0.25, 100.0, 0.16658)]
    public void Ideal_penetration_rate(double radiusM, double farFieldK, double expectedMPerH)
    {
        Approx.Rel(expectedMPerH, IdealMeltRate.VelocityMPerS(5000.0, radiusM, farFieldK, 273.15, 1.0) * 3600, 1e-4, "v0");
        var steady = SteadyDescent.Solve(new ProbeGeometry(radiusM, 2.5, 2000.0), 5000.0, 0.0, farFieldK, NormalPressurePa, 9.80665);
        Approx.Rel(expectedMPerH, steady.IdealVelocityMPerS * 3600, 1e-4, "v0 in the steady model");
    }

    [Theory]
    // Computed (CALC), reference note §4.2 (PRB-5): constant power 5 kW, R 0.1 m, T∞ 250 K, m 200 kg, ℓ 2.5 m, f = ½;
    // tolerance 1e-3 rel. Columns: g, F, v (m/h), δ (µm), ΔT_f (K), δ with f = 0 (µm).
    [InlineData(9.81, 1191.65, 1.4863, 64.57, 18.50, 66.71)]
    [InlineData(3.71, 450.66, 1.4371, 88.29, 25.29, 92.25)]
    [InlineData(1.315, 159.74, 1.3711, 122.82, 35.18, 130.34)]
    [InlineData(0.113, 13.73, 1.1557, 262.91, 75.31, 295.38)]
    public void Close_contact_melting_at_constant_power(double g, double loadN, double vMPerH, double filmUm, double superheatK, double filmNoSuperheatUm)
    {
        var s = SteadyDescent.Solve(Probe, 5000.0, 0.0, 250.0, NormalPressurePa, g);
        Approx.Rel(vMPerH, s.VelocityMPerS * 3600, 1e-3, "v");
        Approx.Rel(filmUm, s.FilmThicknessM * 1e6, 1e-3, "delta");
        Approx.Rel(superheatK, s.HeadSuperheatK, 1e-3, "Delta T_f");

        var rho = IceIh.DensityKgPerM3(250.0, NormalPressurePa);
        var h = FusionLatentHeat.AtPressureJPerKg(NormalPressurePa) + IceIh.SensibleHeatJPerKg(250.0, MeltingCurve.TemperatureK(NormalPressurePa), NormalPressurePa);
        var noSuperheat = CloseContactMelting.AtConstantPower(5000.0 / (Math.PI * 0.01), 0.1, loadN, rho, h, 0.0);
        Approx.Rel(filmNoSuperheatUm, noSuperheat.FilmThicknessM * 1e6, 1e-3, "delta(f=0)");
        Approx.Rel(1.63891, noSuperheat.VelocityMPerS * 3600, 1e-4, "v(f=0) = v0");
    }

    [Theory]
    // Computed (CALC), reference note PRB-6: constant head superheat 20 K, R 0.1 m, T∞ 250 K, H = 379.999 kJ/kg,
    // ρ_i at 250 K; tolerance 1e-3 rel. Columns: F (N), v (m/h), implied P_h (W).
    [InlineData(100.0, 0.9128, 2784.7)]
    [InlineData(1000.0, 1.6232, 4952.0)]
    [InlineData(10000.0, 2.8864, 8806.0)]
    public void Close_contact_melting_at_constant_superheat(double loadN, double vMPerH, double impliedPowerW)
    {
        var rho = IceIh.DensityKgPerM3(250.0, NormalPressurePa);
        var s = CloseContactMelting.AtConstantSuperheat(20.0, 0.1, loadN, rho, 379_999.0);
        Approx.Rel(vMPerH, s.VelocityMPerS * 3600, 1e-3, "v");
        Approx.Rel(impliedPowerW, rho * Math.PI * 0.01 * s.VelocityMPerS * 379_999.0, 1e-3, "P_h");
    }

    [Fact]
    public void Stall_limit_of_spheres_and_probes()
    {
        // Computed (CALC), reference note §4.4 (PRB-8), a = 651 W/m, T_m = 273.15 K; tolerance 1e-3 rel. The
        // stall condition is our reconstruction of Lorenz (2012), Astrobiology 12, 799 (abstract only).
        var phi250 = IceConductivity.KirchhoffPotentialWPerM(250.0, 273.15, IceConductivityFit.PetrenkoWhitworth1999);
        var phi100 = IceConductivity.KirchhoffPotentialWPerM(100.0, 273.15, IceConductivityFit.PetrenkoWhitworth1999);
        Approx.Rel(72.45, StallLimit.StallPowerW(StallLimit.SphereCapacitanceM(0.1), phi250), 1e-3, "sphere 250 K");
        Approx.Rel(822.04, StallLimit.StallPowerW(StallLimit.SphereCapacitanceM(0.1), phi100), 1e-3, "sphere 100 K");
        var c = StallLimit.ProbeCapacitanceM(0.1, 2.5);
        Approx.Rel(4.8667, c, 1e-3, "spheroid C");
        Approx.Rel(280.58, StallLimit.StallPowerW(c, phi250), 1e-3, "probe 250 K");
        Approx.Rel(3183.6, StallLimit.StallPowerW(c, phi100), 1e-3, "probe 100 K");
        Approx.Rel(201.73, StallLimit.SteadySurfaceTemperatureK(250.0, StallLimit.SphereCapacitanceM(0.05), 100.0, 567.0), 1e-3, "T_s");
        // The spheroid capacitance tends to the sphere's as the probe gets short.
        Approx.Rel(StallLimit.SphereCapacitanceM(0.1), StallLimit.ProbeCapacitanceM(0.1, 0.2000002), 1e-5, "sphere limit");
    }

    [Fact]
    public void Weak_probe_stalls_in_cold_ice()
    {
        var s = SteadyDescent.Solve(Probe, 1500.0, 0.0, 100.0, NormalPressurePa, 1.315);
        Assert.True(s.Stalled);
        Assert.Equal(0.0, s.VelocityMPerS);
        Assert.False(s.WallPowerSufficient);
        Assert.Equal(1500.0, s.LateralLossW);
        Assert.False(SteadyDescent.Solve(Probe, 5000.0, 0.0, 100.0, NormalPressurePa, 1.315).Stalled);
    }

    [Theory]
    // Computed (CALC), reference note §4.5 (PRB-9) and §5.3 (FRZ-4): R 0.1 m, ℓ 2.5 m, m 200 kg, P_h 5 kW,
    // k = 651/T, f = ½, T_m 273.15 K; tolerance 2e-3 rel.
    // Columns: T∞, g, v (m/h), δ (µm), ΔT_f, Q_lat(2.5 m) (W), η_head, η_probe with P_s = Q_lat, Q_w (W), ṁL (W).
    [InlineData(250.0, 9.80665, 1.48625, 64.58, 18.498, 1534.1, 0.9069, 0.694, 465.73, 3978.6)]
    [InlineData(100.0, 1.315, 0.93677, 108.68, 31.133, 11452.0, 0.8998, 0.273, 501.04, 2543.2)]
    public void Worked_examples(double farFieldK, double g, double vMPerH, double filmUm, double superheatK, double lateralW, double headEff, double probeEff, double filmHeatW, double latentW)
    {
        var s = SteadyDescent.Solve(Probe, 5000.0, 0.0, farFieldK, NormalPressurePa, g);
        Approx.Rel(vMPerH, s.VelocityMPerS * 3600, 2e-3, "v");
        Approx.Rel(filmUm, s.FilmThicknessM * 1e6, 2e-3, "delta");
        Approx.Rel(superheatK, s.HeadSuperheatK, 2e-3, "Delta T_f");
        Approx.Rel(lateralW, s.LateralDemandW, 2e-3, "Q_lat");
        Approx.Rel(headEff, s.VelocityMPerS / s.IdealVelocityMPerS, 2e-3, "eta_head");
        Approx.Rel(filmHeatW, s.FilmSuperheatW, 2e-3, "Q_w");
        Approx.Rel(latentW, s.LatentW, 2e-3, "m L");
        Assert.False(s.WallPowerSufficient);

        var heated = SteadyDescent.Solve(Probe, 5000.0, s.LateralDemandW, farFieldK, NormalPressurePa, g);
        Assert.True(heated.WallPowerSufficient);
        Approx.Rel(probeEff, (heated.SensibleW + heated.LatentW) / (5000.0 + s.LateralDemandW), 2e-3, "eta_probe");
    }

    [Fact]
    public void Worked_example_intermediates()
    {
        // Same worked examples (PRB-9, computed): buoyancy-corrected load, Φ, κ_eff, τ_ℓ and H(τ_ℓ).
        var rho250 = IceIh.DensityKgPerM3(250.0, NormalPressurePa);
        var phi = IceConductivity.KirchhoffPotentialWPerM(250.0, 273.15, IceConductivityFit.PetrenkoWhitworth1999);
        var kappa = LateralConduction.EffectiveDiffusivityM2PerS(phi, rho250, IceIh.SensibleHeatJPerKg(250.0, 273.15, NormalPressurePa));
        Approx.Rel(57.6527, phi, 2e-3, "Phi A");
        Approx.Rel(1.34567e-6, kappa, 2e-3, "kappa A");
        var tau = kappa * 2.5 / ((1.48625 / 3600) * 0.01);
        Approx.Rel(0.81487, tau, 2e-3, "tau A");
        Approx.Rel(1.38038, CylinderConduction.H(tau), 2e-3, "H A");
        Approx.Rel(1191.24, (200.0 - (999.84 * Probe.VolumeM3)) * 9.80665, 1e-5, "F A");

        var rho100 = IceIh.DensityKgPerM3(100.0, NormalPressurePa);
        var phiB = IceConductivity.KirchhoffPotentialWPerM(100.0, 273.15, IceConductivityFit.PetrenkoWhitworth1999);
        Approx.Rel(654.158, phiB, 2e-3, "Phi B");
        Approx.Rel(2.73438e-6, LateralConduction.EffectiveDiffusivityM2PerS(phiB, rho100, IceIh.SensibleHeatJPerKg(100.0, 273.15, NormalPressurePa)), 2e-3, "kappa B");
    }

    [Theory]
    [InlineData(5000.0, 0.0, 250.0, 9.80665)]
    [InlineData(5000.0, 3000.0, 250.0, 9.80665)]
    [InlineData(5000.0, 20000.0, 100.0, 1.315)]
    [InlineData(800.0, 100.0, 260.0, 0.113)]
    [InlineData(5000.0, 0.0, 273.0, 3.71)]
    public void Power_breakdown_sums_to_power_in(double headW, double wallW, double farFieldK, double g)
    {
        // The head's fixed point is solved to 1e-12 in ΔT_f; the sinks must add up to 1e-9 relative.
        var s = SteadyDescent.Solve(Probe, headW, wallW, farFieldK, NormalPressurePa, g);
        Approx.Rel(headW + wallW, s.SensibleW + s.LatentW + s.LateralLossW + s.WallSurplusW, 1e-9, "balance");
        Approx.Rel(headW, s.SensibleW + s.LatentW + s.FilmSuperheatW, 1e-9, "head balance");
        Assert.True(s.WallSurplusW >= 0);
    }

    [Fact]
    public void Temperate_ice_has_no_lateral_loss()
    {
        var tm = MeltingCurve.TemperatureK(NormalPressurePa);
        var s = SteadyDescent.Solve(Probe, 5000.0, 0.0, tm, NormalPressurePa, 9.80665);
        Assert.Equal(0.0, s.SensibleW);
        Assert.Equal(0.0, s.LateralDemandW);
        Assert.True(s.WallPowerSufficient);
    }

    [Theory]
    [InlineData(0.1, 2.5, 200.0, 5000.0, 0.0, 280.0, 101325.0, 9.8, "farFieldTemperatureK")] // warmer than its melting point
    [InlineData(0.1, 2.5, 200.0, 5000.0, 0.0, 40.0, 101325.0, 9.8, "farFieldTemperatureK")] // colder than the conductivity fit
    [InlineData(0.1, 2.5, 200.0, 5000.0, 0.0, 250.0, 100.0, 9.8, "pressurePa")] // below the triple point: no liquid
    [InlineData(0.1, 2.5, 200.0, 5000.0, 0.0, 250.0, 80e6, 9.8, "pressurePa")] // latent heat not trusted
    [InlineData(0.1, 2.5, 200.0, -1.0, 0.0, 250.0, 101325.0, 9.8, "headPowerW")]
    [InlineData(0.1, 2.5, 200.0, 5000.0, 0.0, 250.0, 101325.0, 0.0, "gravityMPerS2")]
    [InlineData(0.3, 2.5, 200.0, 5000.0, 0.0, 250.0, 101325.0, 9.8, "geometry")] // lighter than its displaced water
    [InlineData(-0.1, 2.5, 200.0, 5000.0, 0.0, 250.0, 101325.0, 9.8, "RadiusM")]
    public void Bad_input_gives_the_range_error(double r, double l, double m, double head, double wall, double farFieldK, double p, double g, string quantity)
    {
        var e = Assert.ThrowsAny<ArgumentOutOfRangeException>(() => SteadyDescent.Solve(new ProbeGeometry(r, l, m), head, wall, farFieldK, p, g));
        Assert.Equal(quantity, e.ParamName);
        Assert.Contains("valid range", e.Message);
    }
}
