using DescentOps.Physics.Ice;
using Xunit;

namespace DescentOps.Physics.Tests.Ice;

public class CurveTests
{
    [Fact]
    public void Melting_and_sublimation_pressures_match_the_release_check_values()
    {
        // IAPWS R14-08(2011), "Revised Release on the Pressure along the Melting and Sublimation Curves of Ordinary
        // Water Substance", Table 3 (Wagner et al. 2011, J. Phys. Chem. Ref. Data 40, 043103): 6 printed digits.
        Approx.Rel(138.268e6, MeltingCurve.PressurePa(260.0), 1e-6, "p_m(260 K)");
        Approx.Rel(8.94735, SublimationCurve.PressurePa(230.0), 1e-6, "p_s(230 K)");
    }

    [Fact]
    public void Both_curves_pass_through_the_triple_point()
    {
        // Identity of the correlations (computed, reference note CRV-3).
        Approx.Rel(611.657, MeltingCurve.PressurePa(273.16), 1e-9, "p_m(T_t)");
        Approx.Rel(611.657, SublimationCurve.PressurePa(273.16), 1e-9, "p_s(T_t)");
        Assert.Equal(273.16, MeltingCurve.TemperatureK(611.657), 9);
    }

    [Theory]
    // Computed (CALC) in the reference note §2.1 (CRV-4) by bisection on R14-08; 1e-4 K as stated there.
    [InlineData(0.101325e6, 273.15252)]
    [InlineData(1e6, 273.0856)]
    [InlineData(10e6, 272.4017)]
    [InlineData(24.2e6, 271.2711)]
    [InlineData(50e6, 269.0595)]
    [InlineData(100e6, 264.2087)]
    [InlineData(200e6, 252.3167)]
    public void Inverts_the_melting_curve(double pressurePa, double expectedK)
    {
        Approx.Abs(expectedK, MeltingCurve.TemperatureK(pressurePa), 1e-4, "T_m");
    }

    [Fact]
    public void Melting_slope_is_the_analytic_derivative()
    {
        // Computed (CALC) in the reference note (CRV-5): dT_m/dp = −0.07431 K/MPa at 273.15 K, to 1e-5 K/MPa.
        Approx.Abs(-0.07431, 1e6 / MeltingCurve.SlopePaPerK(273.15), 1e-5, "dT_m/dp");
        // and it is the derivative of p_m(T): a centred difference must agree closely.
        var numeric = (MeltingCurve.PressurePa(260.001) - MeltingCurve.PressurePa(259.999)) / 0.002;
        Approx.Rel(numeric, MeltingCurve.SlopePaPerK(260.0), 1e-6, "slope vs difference");
    }

    [Theory]
    // Computed (CALC) in the reference note (CRV-6), 1e-4 rel.
    [InlineData(100.0, 1.0857e-14)]
    [InlineData(150.0, 6.0957e-6)]
    [InlineData(200.0, 0.16260)]
    [InlineData(250.0, 76.013)]
    public void Sublimation_pressure_at_cold_temperatures(double t, double expectedPa)
    {
        Approx.Rel(expectedPa, SublimationCurve.PressurePa(t), 1e-4, "p_s");
    }

    [Fact]
    public void Agrees_with_the_IAPWS_Python_library_along_both_curves()
    {
        // Golden tables from python3-iapws (shared/reference/README.md).
        foreach (var r in GoldenTable.Read("ice-melting-curve.csv"))
        {
            Approx.Rel(r[1], MeltingCurve.PressurePa(r[0]), 1e-11, $"p_m({r[0]} K)");
            if (r[0] > TriplePoint.IhIiiLiquidTemperatureK && r[0] < TriplePoint.TemperatureK) Approx.Abs(r[0], MeltingCurve.TemperatureK(r[1]), 1e-8, $"T_m({r[1]} Pa)");
        }

        var sublimation = GoldenTable.Read("ice-sublimation-curve.csv");
        Assert.True(sublimation.Count > 200);
        foreach (var r in sublimation) Approx.Rel(r[1], SublimationCurve.PressurePa(r[0]), 1e-10, $"p_s({r[0]} K)");
    }

    [Fact]
    public void Refuses_points_off_the_curves()
    {
        Assert.Contains("valid range", Assert.ThrowsAny<ArgumentOutOfRangeException>(() => MeltingCurve.PressurePa(250.0)).Message);
        Assert.ThrowsAny<ArgumentOutOfRangeException>(() => MeltingCurve.TemperatureK(300e6));
        Assert.ThrowsAny<ArgumentOutOfRangeException>(() => MeltingCurve.TemperatureK(100.0));
        Assert.ThrowsAny<ArgumentOutOfRangeException>(() => SublimationCurve.PressurePa(40.0));
        Assert.ThrowsAny<ArgumentOutOfRangeException>(() => SublimationCurve.PressurePa(274.0));
    }
}
