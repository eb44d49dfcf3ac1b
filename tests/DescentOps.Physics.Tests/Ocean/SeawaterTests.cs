using DescentOps.Physics.Ocean;
using Xunit;

namespace DescentOps.Physics.Tests.Ocean;

public class SeawaterTests
{
    private const double ZeroCelsiusK = 273.15;

    // Published EOS-80/UNESCO check values are quoted on the IPTS-68 scale; this turns them into the ITS-90 kelvin the
    // models take (t68 = 1.00024 t90).
    private static double KelvinFromT68(double t68C) => (t68C / 1.00024) + ZeroCelsiusK;

    // Fofonoff & Millard 1983, "Algorithms for computation of fundamental properties of seawater", UNESCO Tech. Pap.
    // Mar. Sci. 44, EOS-80 check values; recalled from memory in the project's reference note (SW-3..SW-6, PUB(mem)).
    // 1e-5 is the last digit printed.
    [Theory]
    [InlineData(0.0, 5.0, 0.0, 999.96675)]
    [InlineData(35.0, 5.0, 0.0, 1027.67547)]
    [InlineData(35.0, 25.0, 10000.0, 1062.53817)]
    [InlineData(40.0, 40.0, 10000.0, 1059.82037)]
    public void EOS80_density_check_values(double s, double t68C, double pDbar, double expectedKgPerM3) =>
        Approx.Abs(expectedKgPerM3, SeawaterDensity.Eos80KgPerM3(s, KelvinFromT68(t68C), pDbar * 1e4), 1e-5, "rho");

    [Fact]
    public void EOS80_at_ITS90_five_degrees()
    {
        // SW-9 CALC (reference note): EOS-80 at S_P 35, t90 5 °C (t68 5.0012), sea surface: 1027.6753. Regression only.
        Approx.Abs(1027.6753, SeawaterDensity.Eos80KgPerM3(35.0, ZeroCelsiusK + 5.0, 0.0), 1e-4, "rho");
    }

    [Fact]
    public void Secant_bulk_modulus_is_that_of_the_density_ratio()
    {
        var state = SeawaterDensity.Eos80(35.0, ZeroCelsiusK + 2.0, 30e6);
        // rho = rho0 / (1 - p/K) rearranged: the three returned numbers must be mutually consistent.
        Approx.Rel(state.SurfaceDensityKgPerM3 / (1.0 - (30e6 / state.SecantBulkModulusPa)), state.DensityKgPerM3, 1e-14, "rho");
        Approx.Abs(SeawaterDensity.Eos80KgPerM3(35.0, ZeroCelsiusK + 2.0, 0.0), state.SurfaceDensityKgPerM3, 1e-12, "rho0");
    }

    // UNESCO 1983 check value for the Chen-Millero speed (AC-3, PUB(mem), reproduced to 1e-4 in the note) and
    // the UNESCO 1983 p.50 table as reprinted in Pond & Pickard 1986, "Introductory Dynamical Oceanography" (AC-4,
    // AC-5, PUB, printed to 0.1 m/s, so tolerance 0.05).
    [Theory]
    [InlineData(40.0, 40.0, 10000.0, 1731.995, 1e-3)]
    [InlineData(35.0, 0.0, 0.0, 1449.1, 0.05)]
    [InlineData(25.0, 0.0, 0.0, 1435.8, 0.05)]
    [InlineData(35.0, 30.0, 10000.0, 1710.1, 0.05)]
    public void UNESCO_sound_speed_check_values(double s, double t68C, double pDbar, double expectedMPerS, double tolerance) =>
        Approx.Abs(expectedMPerS, SoundSpeed.UnescoMPerS(s, KelvinFromT68(t68C), pDbar * 1e4), tolerance, "c");

    [Fact]
    public void UNESCO_sound_speed_under_ice()
    {
        // SW-10 CALC (reference note): S_P 35, t90 -1.9 °C, 2420 dbar (ocean top under 20 km of ice at g 1.315).
        Approx.Abs(1480.453, SoundSpeed.UnescoMPerS(35.0, ZeroCelsiusK - 1.9, 2420e4), 1e-3, "c");
    }

    // Mackenzie 1981, "Nine-term equation for sound speed in the oceans", JASA 70(3): 1550.744 m/s at 25 °C, 35, 1000 m is
    // the widely quoted check value (from memory); the other two are CALC regressions from the reference note (AC-1, AC-2).
    [Theory]
    [InlineData(35.0, 25.0, 1000.0, 1550.744)]
    [InlineData(35.0, 10.0, 1000.0, 1506.264)]
    [InlineData(34.0, -1.9, 0.0, 1438.685)]
    public void Mackenzie_check_values(double s, double tC, double depthM, double expectedMPerS) =>
        Approx.Abs(expectedMPerS, SoundSpeed.MackenzieMPerS(s, ZeroCelsiusK + tC, depthM), 1e-3, "c");

    // UNESCO 1983 p.28 depth table (Fofonoff & Millard 1983), PUB, printed to 0.01 m (SW-11, SW-12).
    [Theory]
    [InlineData(10000.0, 0.0, 9725.47)]
    [InlineData(10000.0, 30.0, 9712.65)]
    [InlineData(10000.0, 45.0, 9699.84)]
    [InlineData(10000.0, 90.0, 9674.23)]
    [InlineData(500.0, 0.0, 496.65)]
    [InlineData(5000.0, 45.0, 4902.08)]
    public void UNESCO_depth_table(double pDbar, double latitudeDeg, double expectedM) =>
        Approx.Abs(expectedM, SeawaterPressureDepth.UnescoEarthDepthM(pDbar * 1e4, latitudeDeg * Math.PI / 180.0), 0.01, "z");

    [Fact]
    public void Saunders_depth()
    {
        // SW-13 CALC with coefficients recalled from memory (Saunders 1981, J. Phys. Oceanogr. 11).
        Approx.Abs(9706.68, SeawaterPressureDepth.SaundersEarthDepthM(10000e4, Math.PI / 6), 0.01, "z");
        // Saunders states about 0.1 % agreement with the full formula; hold it to that against the UNESCO table value.
        Approx.Rel(9712.65, SeawaterPressureDepth.SaundersEarthDepthM(10000e4, Math.PI / 6), 1e-3, "z vs UNESCO");
    }

    [Theory]
    [InlineData(1.315, 72414.0)]
    [InlineData(0.113, 842694.0)]
    public void Standard_ocean_depth_on_other_bodies(double gravityMPerS2, double expectedM)
    {
        // SW-14 CALC (reference note), 0.1 % rel.
        Approx.Rel(expectedM, SeawaterPressureDepth.StandardOceanDepthM(10000e4, gravityMPerS2), 1e-3, "z");
    }

    [Theory]
    [InlineData(1000e4)]
    [InlineData(5000e4)]
    [InlineData(10000e4)]
    public void Integrated_depth_of_the_standard_ocean_matches_the_UNESCO_numerator(double seaPressurePa)
    {
        // The UNESCO numerator is, by its construction (Saunders & Fofonoff 1976), ∫dp/ρ of a 35 PSU, 0 °C ocean; the
        // EOS-80 integral is an independent route to the same number. Their fit agreed to about 0.1 m at 10 km, so
        // allow 2e-5 relative.
        var integrated = SeawaterPressureDepth.IntegratedDepthM(0.0, seaPressurePa, 1.315, 35.0, KelvinFromT68(0.0));
        Approx.Rel(SeawaterPressureDepth.StandardOceanDepthM(seaPressurePa, 1.315), integrated, 2e-5, "z");
    }

    [Theory]
    [InlineData(0.0, 35.0, 271.35, 1.315, 3000.0)]
    [InlineData(24.2e6, 10.0, 273.0, 0.113, 40000.0)]
    public void Pressure_and_depth_integrals_invert_each_other(double topPa, double salinity, double temperatureK, double g, double depthM)
    {
        var bottom = SeawaterPressureDepth.IntegratedSeaPressurePa(depthM, topPa, g, salinity, temperatureK);
        Assert.True(bottom > topPa + (1000.0 * g * depthM), "water column is denser than fresh water");
        Approx.Rel(depthM, SeawaterPressureDepth.IntegratedDepthM(topPa, bottom, g, salinity, temperatureK), 1e-9, "round trip");
    }

    [Fact]
    public void Outside_the_fits_the_models_refuse()
    {
        var e = Assert.ThrowsAny<ArgumentOutOfRangeException>(() => SeawaterDensity.Eos80(43.0, 275.0, 0.0));
        Assert.Equal("practicalSalinity", e.ParamName);
        Assert.Contains("[0, 42]", e.Message, StringComparison.Ordinal);
        Assert.ThrowsAny<ArgumentOutOfRangeException>(() => SeawaterDensity.Eos80(35.0, 270.0, 0.0));
        Assert.ThrowsAny<ArgumentOutOfRangeException>(() => SoundSpeed.UnescoMPerS(35.0, 275.0, 101e6));
        var m = Assert.ThrowsAny<ArgumentOutOfRangeException>(() => SoundSpeed.MackenzieMPerS(20.0, 275.0, 10.0));
        Assert.Equal("practicalSalinity", m.ParamName);
        Assert.ThrowsAny<ArgumentOutOfRangeException>(() => SoundSpeed.MackenzieMPerS(35.0, 275.0, 9000.0));
        Assert.ThrowsAny<ArgumentOutOfRangeException>(() => SeawaterPressureDepth.StandardOceanDepthM(1e6, 0.0));
    }
}
