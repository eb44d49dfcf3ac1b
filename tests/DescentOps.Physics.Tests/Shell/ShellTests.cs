using DescentOps.Physics.Ice;
using DescentOps.Physics.Shell;
using DescentOps.Physics.Water;
using Xunit;

namespace DescentOps.Physics.Tests.Shell;

public class ShellTests
{
    [Theory]
    // Computed (CALC) in the reference note §3.1 (SHL-1, SHL-2), a = 651 W/m; tolerances 1e-3 K and 1e-3 mW/m².
    [InlineData(100.0, 270.0, 164.3168, 32.3303)]
    [InlineData(60.0, 273.0, 127.9844, 49.3174)]
    public void Flat_lid_profile_and_flux(double surfaceK, double baseK, double midK, double fluxMilliWPerM2)
    {
        var lid = new PlaneConductiveLid(surfaceK, baseK, 20e3);
        Approx.Abs(midK, lid.TemperatureK(10e3), 1e-3, "T(10 km)");
        Approx.Abs(fluxMilliWPerM2, lid.HeatFluxWPerM2 * 1e3, 1e-3, "q");
        Assert.Equal(surfaceK, lid.TemperatureK(0), 9);
        Assert.Equal(baseK, lid.TemperatureK(20e3), 9);
    }

    [Theory]
    // Computed (CALC) in the reference note §3.1 (SHL-3, SHL-4), a = 651 W/m, D = 20 km.
    [InlineData(1560.8e3, 100.0, 270.0, 163.7914, 31.9161)]
    [InlineData(252.1e3, 60.0, 273.0, 124.0416, 45.4049)]
    public void Spherical_shell_profile_and_flux(double radiusM, double surfaceK, double baseK, double midK, double fluxMilliWPerM2)
    {
        var lid = new SphericalConductiveLid(surfaceK, baseK, radiusM, 20e3);
        Approx.Abs(midK, lid.TemperatureK(10e3), 1e-3, "T(mid-radius)");
        Approx.Abs(fluxMilliWPerM2, lid.SurfaceHeatFluxWPerM2 * 1e3, 1e-3, "q(r_s)");
    }

    [Fact]
    public void Spherical_flux_conserves_heat()
    {
        // Independent of any table: q r² is constant in steady spherical conduction; check it from the profile's
        // local gradient, k dT/dr with k = a/T, at two radii.
        var lid = new SphericalConductiveLid(60.0, 273.0, 252.1e3, 20e3);
        double FluxTimesR2(double depth)
        {
            const double h = 0.5;
            var t = lid.TemperatureK(depth);
            var dTdz = (lid.TemperatureK(depth + h) - lid.TemperatureK(depth - h)) / (2 * h);
            var r = 252.1e3 - depth;
            return 651.0 / t * dTdz * r * r;
        }

        Approx.Rel(lid.SurfaceHeatFluxWPerM2 * 252.1e3 * 252.1e3, FluxTimesR2(5e3), 1e-6, "depth 5 km");
        Approx.Rel(FluxTimesR2(5e3), FluxTimesR2(15e3), 1e-6, "5 vs 15 km");
    }

    [Fact]
    public void Hydrostatic_pressure_of_a_large_icy_moon_shell()
    {
        // Computed (CALC) in the reference note §3.2 (SHL-5): g 1.315, D 20 km, SHL-1 profile with T_b 271.3 K,
        // R10-06 density, midpoint rule, 2000 steps: p(D) = 24.438 MPa, T_m = 271.252 K; tolerances 0.01 MPa, 0.01 K.
        var lid = new PlaneConductiveLid(100.0, 271.3, 20e3);
        var p = HydrostaticPressure.AtDepthPa(lid.TemperatureK, 20e3, 1.315, 0.0);
        Approx.Abs(24.438e6, p, 0.01e6, "p(D)");
        Approx.Abs(271.252, MeltingCurve.TemperatureK(p), 0.01, "T_m(p(D))");
        Approx.Abs(24.196e6, HydrostaticPressure.ConstantDensityPa(920.0, 20e3, 1.315), 0.01e6, "shortcut");
    }

    [Fact]
    public void Hydrostatic_pressure_of_a_small_icy_moon_shell()
    {
        // Computed (CALC), reference note SHL-6: g 0.113, D 20 km, T_s 60 K, T_b 273 K → 2.1016 MPa, T_m 273.003 K.
        var lid = new PlaneConductiveLid(60.0, 273.0, 20e3);
        var p = HydrostaticPressure.AtDepthPa(lid.TemperatureK, 20e3, 0.113, 0.0);
        Approx.Abs(2.1016e6, p, 0.01e6, "p(D)");
        Approx.Abs(273.003, MeltingCurve.TemperatureK(p), 0.01, "T_m");
    }

    [Fact]
    public void Shell_finds_its_pressure_melting_base()
    {
        // Computed (CALC), reference note SHL-7: a 3 km terrestrial ice sheet, g 9.80665, T_s 243.15 K:
        // 27.076 MPa at the base and T_m 271.035 K there; tolerances 0.01 MPa and 0.01 K.
        var shell = new IceShell(243.15, 3e3, 9.80665);
        Approx.Abs(27.076e6, shell.BasePressurePa, 0.01e6, "p(D)");
        Approx.Abs(271.035, shell.BaseTemperatureK, 0.01, "T_b");
        // The iteration is self-consistent: the base temperature is the melting point of the base pressure.
        Approx.Abs(MeltingCurve.TemperatureK(shell.BasePressurePa), shell.BaseTemperatureK, 1e-5, "self-consistency");
    }

    [Fact]
    public void Salt_in_the_basal_layer_lowers_the_base_temperature()
    {
        var pure = new IceShell(100.0, 20e3, 1.315);
        var salty = new IceShell(100.0, 20e3, 1.315, layers: [new IceLayer(19e3, 20e3, 35.0)]);
        // UNESCO 1983 salt term at S = 35 is −1.9223 K (formula arithmetic, computed); pressure barely shifts.
        Approx.Abs(pure.BaseTemperatureK - 1.9223, salty.BaseTemperatureK, 0.01, "salty base");
        Assert.Equal(35.0, salty.SalinityGPerKg(19.5e3));
        Assert.Equal(0.0, salty.SalinityGPerKg(10e3));
        Assert.True(salty.HeatFluxWPerM2 < pure.HeatFluxWPerM2);
        Assert.True(salty.PressurePa(10e3) > 0.4 * salty.BasePressurePa && salty.PressurePa(10e3) < 0.6 * salty.BasePressurePa);
    }

    [Fact]
    public void Debris_accumulates_on_the_head()
    {
        // Computed (CALC), reference note ATT-1: φ_d 1e-6 → 1.7 mm per km; 1e-4 → 0.17 m per km (n_p 0.4).
        var shell = new IceShell(250.0, 3e3, 9.80665, debrisBands: [new DebrisBand(0, 1e3, 1e-6), new DebrisBand(1e3, 2e3, 1e-4)]);
        Approx.Abs(1.7e-3, shell.AccumulatedDebrisThicknessM(0, 1e3), 0.05e-3, "1e-6");
        Approx.Abs(0.17, shell.AccumulatedDebrisThicknessM(1e3, 2e3), 0.005, "1e-4");
        Assert.Equal(0.0, shell.AccumulatedDebrisThicknessM(2e3, 3e3));
        Assert.Equal(1e-4, shell.DebrisVolumeFraction(1.5e3));
    }

    [Fact]
    public void Shell_rejects_bad_layers()
    {
        Assert.Throws<ArgumentException>(() => new IceShell(100, 20e3, 1.3, layers: [new IceLayer(0, 10e3, 1), new IceLayer(5e3, 12e3, 2)]));
        Assert.ThrowsAny<ArgumentOutOfRangeException>(() => new IceShell(100, 20e3, 1.3, layers: [new IceLayer(0, 30e3, 1)]));
        Assert.ThrowsAny<ArgumentOutOfRangeException>(() => new IceShell(100, 20e3, 1.3, layers: [new IceLayer(0, 1e3, 50)]));
        Assert.ThrowsAny<ArgumentOutOfRangeException>(() => new IceShell(100, 20e3, -1.0));
        Assert.ThrowsAny<ArgumentOutOfRangeException>(() => new IceShell(100, 20e3, 1.3).TemperatureK(21e3));
    }

    [Theory]
    // UNESCO (1983), Fofonoff & Millard, Tech. Pap. Mar. Sci. 44: check value S 40, 500 dbar → −2.588567 °C
    // (recalled from memory, reproduced in the reference note, CRV-8/SW-1); tolerance 1e-6 K.
    [InlineData(40.0, 500.0, -2.588567, 1e-6)]
    // S 35, 0 dbar → −1.922301 °C: formula arithmetic, computed (CRV-8).
    [InlineData(35.0, 0.0, -1.922301, 1e-6)]
    // UNESCO 1983 p.30 table, 3 decimals (reference note SW-2): tolerance 5e-4 K.
    [InlineData(35.0, 500.0, -2.299, 5e-4)]
    [InlineData(5.0, 0.0, -0.274, 5e-4)]
    public void Seawater_freezing_point_check_values(double salinity, double pressureDbar, double expectedC, double tol)
    {
        Approx.Abs(expectedC, SeawaterFreezingPoint.TemperatureK(salinity, pressureDbar * 1e4) - 273.15, tol, "t_f");
    }

    [Fact]
    public void Seawater_freezing_point_agrees_with_TEOS10()
    {
        // Golden table from python3-gsw (TEOS-10, air-free): UNESCO 1983 and TEOS-10 differ by a few mK over
        // S 4–40, 0–500 dbar; 6 mK bounds the largest difference of the two formulations there.
        var rows = GoldenTable.Read("seawater-freezing-point.csv");
        Assert.True(rows.Count >= 28);
        foreach (var r in rows) Approx.Abs(r[2], SeawaterFreezingPoint.TemperatureK(r[0], r[1] * 1e4) - 273.15, 6e-3, $"S {r[0]}, {r[1]} dbar");
    }

    [Fact]
    public void Freezing_point_refuses_its_outside_range()
    {
        var e = Assert.ThrowsAny<ArgumentOutOfRangeException>(() => SeawaterFreezingPoint.TemperatureK(2.0, 0));
        Assert.Contains("[4, 40]", e.Message);
        Assert.ThrowsAny<ArgumentOutOfRangeException>(() => SeawaterFreezingPoint.TemperatureK(35.0, 6e6));
    }

    [Fact]
    public void Brine_volume_of_sea_ice()
    {
        // Computed (CALC), reference note SHL-8, Frankenstein & Garner (1967): S 5 g/kg, −5 °C → 5.18 %.
        Approx.Abs(0.0518, SalineIce.BrineVolumeFraction(5.0, 268.15), 0.0001, "v_b");
        Assert.ThrowsAny<ArgumentOutOfRangeException>(() => SalineIce.BrineVolumeFraction(5.0, 240.0));
    }
}
