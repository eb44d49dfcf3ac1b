using DescentOps.Physics.Descent;
using Xunit;

namespace DescentOps.Physics.Tests.Descent;

public class CylinderConductionTests
{
    [Theory]
    // Computed (CALC) in the reference note §4.3 (PRB-7 table) from the Carslaw & Jaeger (1959, §13.5) integrals;
    // tolerance 2e-4 rel as stated there. Our quadrature is a separate implementation of the same integrals.
    [InlineData(1e-3, 18.3369, 0.03618)]
    [InlineData(3e-3, 10.7933, 0.06329)]
    [InlineData(0.01, 6.12891, 0.11775)]
    [InlineData(0.03, 3.73605, 0.21000)]
    [InlineData(0.1, 2.24875, 0.40434)]
    [InlineData(0.3, 1.47625, 0.75640)]
    [InlineData(1, 0.98377, 1.56829)]
    [InlineData(3, 0.71620, 3.19975)]
    [InlineData(10, 0.53392, 7.40152)]
    [InlineData(30, 0.42610, 16.7405)]
    [InlineData(100, 0.34556, 43.0251)]
    [InlineData(300, 0.29334, 105.720)]
    [InlineData(1000, 0.25096, 292.611)]
    [InlineData(1e4, 0.19593, 2198.34)]
    public void Matches_the_tabulated_functions(double tau, double g, double h)
    {
        // The 4-5 digit table entries are rounded: allow the rounding as well as 2e-4 rel.
        Approx.Rel(g, CylinderConduction.G(tau), 2e-4, "G");
        Approx.Rel(h, CylinderConduction.H(tau), Math.Max(2e-4, 0.6e-5 / h), "H");
    }

    [Theory]
    [InlineData(2e-4)]
    [InlineData(5e-4)]
    [InlineData(2e-3)]
    public void Quadrature_meets_the_short_time_series(double tau)
    {
        // Carslaw & Jaeger short-time expansions (reference note §4.3: G series good to 2e-5 rel below τ = 0.01,
        // H series to 4e-4 rel below 0.1); the quadrature is used in this range.
        var gSeries = (1 / Math.Sqrt(Math.PI * tau)) + 0.5 - (0.25 * Math.Sqrt(tau / Math.PI)) + (tau / 8);
        var hSeries = (2 * Math.Sqrt(tau / Math.PI)) + (tau / 2) - (Math.Pow(tau, 1.5) / (6 * Math.Sqrt(Math.PI))) + (tau * tau / 16);
        Approx.Rel(gSeries, CylinderConduction.G(tau), 2e-5, "G");
        Approx.Rel(hSeries, CylinderConduction.H(tau), 4e-5, "H");
    }

    [Fact]
    public void H_is_the_integral_of_g()
    {
        var integral = MathNet.Numerics.Integrate.OnClosedInterval(CylinderConduction.G, 0.5, 50.0, 1e-10);
        Approx.Rel(integral, CylinderConduction.H(50.0) - CylinderConduction.H(0.5), 1e-7, "∫G");
    }

    [Fact]
    public void Long_time_asymptote()
    {
        // G ≈ 2/Λ − 2γ/Λ², Λ = ln(4τ) − 2γ (Carslaw & Jaeger; reference note: ~1.5 % at 1e4, better beyond).
        const double tau = 1e10;
        var gamma = MathNet.Numerics.Constants.EulerMascheroni;
        var lambda = Math.Log(4 * tau) - (2 * gamma);
        Approx.Rel((2 / lambda) - (2 * gamma / (lambda * lambda)), CylinderConduction.G(tau), 5e-3, "G(1e10)");
        Assert.ThrowsAny<ArgumentOutOfRangeException>(() => CylinderConduction.G(1e13));
        Assert.ThrowsAny<ArgumentOutOfRangeException>(() => CylinderConduction.H(-1));
    }
}
