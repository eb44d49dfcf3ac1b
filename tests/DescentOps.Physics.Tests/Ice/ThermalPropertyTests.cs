using DescentOps.Physics.Ice;
using MathNet.Numerics;
using Xunit;

namespace DescentOps.Physics.Tests.Ice;

public class ThermalPropertyTests
{
    [Theory]
    // Arithmetic of the published fits, computed (CALC) in the reference note §1.4 table; tolerance 1e-3 W/(m K).
    // Fits: Klinger (1980) Science 209, 271; Petrenko & Whitworth (1999) Physics of Ice; Andersson & Inaba (2005)
    // PCCP 7, 1441 (all three recalled from memory); Yen (1981) CRREL Report 81-10, eq. 33.
    [InlineData(IceConductivityFit.Klinger1980, 5.670, 2.268, 2.076)]
    [InlineData(IceConductivityFit.PetrenkoWhitworth1999, 6.510, 2.604, 2.383)]
    [InlineData(IceConductivityFit.AnderssonInaba2005, 6.503, 2.415, 2.156)]
    [InlineData(IceConductivityFit.Yen1981, 5.558, 2.364, 2.072)]
    public void Conductivity_fits(IceConductivityFit fit, double at100K, double at250K, double at273K)
    {
        Approx.Abs(at100K, IceConductivity.ConductivityWPerMK(100.0, fit), 1e-3, "k(100 K)");
        Approx.Abs(at250K, IceConductivity.ConductivityWPerMK(250.0, fit), 1e-3, "k(250 K)");
        Approx.Abs(at273K, IceConductivity.ConductivityWPerMK(273.15, fit), 1e-3, "k(273.15 K)");
    }

    [Theory]
    [InlineData(IceConductivityFit.Klinger1980)]
    [InlineData(IceConductivityFit.PetrenkoWhitworth1999)]
    [InlineData(IceConductivityFit.AnderssonInaba2005)]
    [InlineData(IceConductivityFit.Yen1981)]
    public void Kirchhoff_potential_is_the_integral_of_conductivity(IceConductivityFit fit)
    {
        // Closed forms checked against adaptive quadrature of k(T) itself.
        var numeric = Integrate.OnClosedInterval(t => IceConductivity.ConductivityWPerMK(t, fit), 80.0, 273.15, 1e-10);
        Approx.Rel(numeric, IceConductivity.KirchhoffPotentialWPerM(80.0, 273.15, fit), 1e-9, "Phi");
    }

    [Fact]
    public void Conductivity_refuses_temperatures_outside_the_fit()
    {
        var e = Assert.ThrowsAny<ArgumentOutOfRangeException>(() => IceConductivity.ConductivityWPerMK(55.0, IceConductivityFit.Yen1981));
        Assert.Contains("[60, 273.16]", e.Message);
        Assert.ThrowsAny<ArgumentOutOfRangeException>(() => IceConductivity.ConductivityWPerMK(-3.0));
        Assert.ThrowsAny<ArgumentOutOfRangeException>(() => IceConductivity.ConductivityWPerMK(280.0));
    }

    [Theory]
    // Computed (CALC) in the reference note §1.5 (ICE-5) with R10-06 ρ, c_p at 0.101325 MPa; tolerance 0.01e-6 m²/s.
    [InlineData(100.0, 7.98e-6, 7.97e-6)]
    [InlineData(150.0, 3.80e-6, 3.77e-6)]
    [InlineData(200.0, 2.24e-6, 2.17e-6)]
    [InlineData(250.0, 1.47e-6, 1.36e-6)]
    [InlineData(273.15, 1.24e-6, 1.12e-6)]
    public void Thermal_diffusivity(double t, double withReciprocal, double withAnderssonInaba)
    {
        Approx.Abs(withReciprocal, IceIh.ThermalDiffusivityM2PerS(t, 101325.0, IceConductivityFit.PetrenkoWhitworth1999), 0.01e-6, "kappa a/T");
        Approx.Abs(withAnderssonInaba, IceIh.ThermalDiffusivityM2PerS(t, 101325.0), 0.01e-6, "kappa A-I");
    }

    [Fact]
    public void Latent_heat_at_the_triple_point_and_at_normal_pressure()
    {
        // Computed (CALC) in the reference note §1.6: ICE-6 L_t = 333.445 kJ/kg (tolerance 0.01 kJ/kg), ICE-7
        // L = 333.43 kJ/kg at 0.101325 MPa (tolerance 0.05 kJ/kg).
        Approx.Abs(333_445.0, FusionLatentHeat.TriplePointJPerKg, 10.0, "L_t");
        Approx.Abs(333_430.0, FusionLatentHeat.AtPressureJPerKg(101325.0), 50.0, "L(0.1 MPa)");
    }

    [Fact]
    public void Latent_heat_satisfies_Clapeyron_at_normal_pressure()
    {
        // Clausius–Clapeyron, L = T (v_w − v_i) dp_m/dT, with liquid density 999.843 kg/m³ (IAPWS-95 at 0 °C, from
        // memory), R10-06 ice volume and the R14-08 slope: independent of the enthalpy route (reference note: 333.42 kJ/kg).
        const double t = 273.152519;
        var vIce = IceGibbsFunction.Evaluate(t, 101325.0).GpM3PerKg;
        var clapeyron = t * ((1.0 / 999.843) - vIce) * MeltingCurve.SlopePaPerK(t);
        Approx.Abs(clapeyron, FusionLatentHeat.AtPressureJPerKg(101325.0), 50.0, "L vs Clapeyron");
    }

    [Fact]
    public void Latent_heat_falls_with_pressure_and_refuses_its_untrusted_range()
    {
        var low = FusionLatentHeat.AtPressureJPerKg(1e6);
        var high = FusionLatentHeat.AtPressureJPerKg(40e6);
        Assert.True(high < low);
        var e = Assert.ThrowsAny<ArgumentOutOfRangeException>(() => FusionLatentHeat.AtPressureJPerKg(100e6));
        Assert.Contains("pressurePa", e.Message);
        Assert.ThrowsAny<ArgumentOutOfRangeException>(() => FusionLatentHeat.AtPressureJPerKg(100.0));
        Assert.ThrowsAny<ArgumentOutOfRangeException>(() => FusionLatentHeat.AtMeltingTemperatureJPerKg(260.0));
    }

    [Theory]
    // Computed (CALC) in the reference note §1.7 (ICE-9) from Murphy & Koop (2005) eq. 5; tolerance 0.01 kJ/kg.
    [InlineData(273.16, 2834.21)]
    [InlineData(230.0, 2838.31)]
    [InlineData(200.0, 2832.88)]
    [InlineData(150.0, 2810.00)]
    [InlineData(100.0, 2770.55)]
    public void SublimationEnthalpy_(double t, double expectedKJPerKg)
    {
        Approx.Abs(expectedKJPerKg * 1e3, SublimationEnthalpy.SpecificJPerKg(t), 10.0, "Delta H_sub");
    }

    [Fact]
    public void Sublimation_enthalpy_equals_vapour_minus_ice_at_the_triple_point()
    {
        // IAPWS-95 saturated vapour h'' = 2500.92 kJ/kg at the triple point (from memory) plus L_t from R10-06:
        // an independent route; the note finds 0.005 % difference, so 0.02 % here.
        Approx.Rel(2_500_920.0 + FusionLatentHeat.TriplePointJPerKg, SublimationEnthalpy.SpecificJPerKg(273.16), 2e-4, "triple point");
    }
}
