using DescentOps.Physics.Acoustics;
using Xunit;

namespace DescentOps.Physics.Tests.Acoustics;

public class AcousticsTests
{
    private const double ZeroCelsiusK = 273.15;

    // Francois & Garrison 1982 (JASA 72(3), 72(6)) at pH 8, surface. The printed table (AC-6..AC-8 in the reference
    // note) comes with a public implementation and its origin is not confirmed; the note's own evaluation of the
    // formula (CALC) is what is asserted, to 0.1 % relative, and the printed table to the reference's 1 % / 0.5 %.
    [Theory]
    [InlineData(0.0, 30.0, 1.0, 0.0613, 0.0610, 1e-2)]
    [InlineData(0.0, 35.0, 1.0, 0.0640, 0.0640, 1e-2)]
    [InlineData(10.0, 35.0, 1.0, 0.0601, 0.0600, 1e-2)]
    [InlineData(0.0, 30.0, 10.0, 1.119, 1.12, 5e-3)]
    [InlineData(0.0, 35.0, 10.0, 1.295, 1.29, 5e-3)]
    [InlineData(10.0, 35.0, 10.0, 0.9626, 0.963, 5e-3)]
    [InlineData(0.0, 30.0, 100.0, 20.97, 21.0, 5e-3)]
    [InlineData(0.0, 35.0, 100.0, 23.44, 23.4, 5e-3)]
    [InlineData(10.0, 35.0, 100.0, 33.63, 33.6, 5e-3)]
    public void Francois_Garrison_table(double tC, double s, double fKHz, double calc, double table, double tableTolerance)
    {
        var alpha = SeawaterAbsorption.FrancoisGarrisonDbPerKm(fKHz * 1e3, ZeroCelsiusK + tC, s, 0.0, 8.0);
        // The CALC values carry 4 significant figures, so 1e-3 relative is their rounding.
        Approx.Rel(calc, alpha, 1e-3, "F&G calc");
        Approx.Rel(table, alpha, tableTolerance, "F&G table");
    }

    [Fact]
    public void Ainslie_McColm_check_values()
    {
        // AC-9, AC-10 CALC (reference note).
        Approx.Abs(1.622, SeawaterAbsorption.AinslieMcColmDbPerKm(12e3, ZeroCelsiusK + 4.0, 35.0, 0.0, 8.0), 1e-3, "A&M 12 kHz");
        Approx.Abs(0.9866, SeawaterAbsorption.AinslieMcColmDbPerKm(10e3, ZeroCelsiusK + 10.0, 35.0, 0.0, 8.0), 1e-4, "A&M 10 kHz");
    }

    [Theory]
    [InlineData(4.0, 35.0, 0.0, 12e3)]
    [InlineData(-1.9, 34.0, 3000.0, 5e3)]
    [InlineData(20.0, 30.0, 1000.0, 50e3)]
    [InlineData(0.0, 35.0, 0.0, 500.0)]
    public void Ainslie_McColm_stays_within_ten_percent_of_Francois_Garrison(double tC, double s, double zM, double fHz)
    {
        // Ainslie & McColm 1998 (JASA 103(3)) state 10 % agreement with F&G across this range (PUB(mem) in the note).
        var fg = SeawaterAbsorption.FrancoisGarrisonDbPerKm(fHz, ZeroCelsiusK + tC, s, zM, 8.0);
        Approx.Rel(fg, SeawaterAbsorption.AinslieMcColmDbPerKm(fHz, ZeroCelsiusK + tC, s, zM, 8.0), 0.10, "A&M vs F&G");
    }

    [Fact]
    public void Thorp_at_10_kHz()
    {
        // AC-11 CALC: Thorp 1967 gives 1.0819 dB/kyd at 10 kHz, i.e. 1.1832 dB/km.
        Approx.Abs(1.1832, SeawaterAbsorption.ThorpDbPerKm(10e3), 1e-4, "Thorp");
    }

    [Fact]
    public void Coates_noise()
    {
        // AC-12 CALC (reference note): 10 kHz, s = 0.5, no wind / 10 m/s wind.
        Approx.Abs(29.35, AmbientNoise.SpectralLevel(10e3, 0.5, 0.0).TotalDb, 0.01, "calm");
        Approx.Abs(53.04, AmbientNoise.SpectralLevel(10e3, 0.5, 10.0).TotalDb, 0.01, "windy");
        var n = AmbientNoise.SpectralLevel(10e3, 0.5, 10.0);
        Assert.True(n.TotalDb >= Math.Max(Math.Max(n.TurbulenceDb, n.ShippingDb), Math.Max(n.WindDb, n.ThermalDb)));
    }

    [Fact]
    public void One_watt_source_level()
    {
        // AC-13 CALC: the textbook 170.8 dB re 1 µPa at 1 m for 1 W omnidirectional (e.g. Urick, "Principles of
        // Underwater Sound"; from memory), here from ρc = 1.5e6 Rayl.
        Approx.Abs(170.77, SourceLevel.FromAcousticPowerDb(1.0, 0.0), 0.01, "SL");
        Approx.Abs(180.77, SourceLevel.FromAcousticPowerDb(10.0, 0.0), 0.01, "SL x10");
    }

    private static AcousticLink Ac14Link(double transitionM)
    {
        var alpha = SeawaterAbsorption.FrancoisGarrisonDbPerKm(12e3, ZeroCelsiusK + 4.0, 35.0, 0.0, 8.0);
        var noise = AmbientNoise.SpectralLevel(12e3, 0.5, 0.0).TotalDb;
        return new AcousticLink(185.0, alpha, 2.0, transitionM, 4000.0, noise, -1000.0, 0.0, 0.0);
    }

    [Fact]
    public void Sonar_equation_check_values()
    {
        // AC-14 and AC-15 CALC (reference note).
        var spherical = SonarEquation.Evaluate(Ac14Link(0.0), 5000.0);
        Approx.Abs(81.95, spherical.TransmissionLossDb, 0.01, "TL");
        Approx.Abs(63.91, spherical.NoiseLevelDb, 0.01, "NL");
        Approx.Abs(39.13, spherical.SignalToNoiseDb, 0.01, "SNR");
        Approx.Abs(74.96, SonarEquation.Evaluate(Ac14Link(1000.0), 5000.0).TransmissionLossDb, 0.01, "TL sph-cyl");
    }

    [Fact]
    public void Self_noise_floors_quiet_ice()
    {
        var quiet = AmbientNoise.SpectralLevel(12e3, 0.0, 0.0).TotalDb;
        var link = Ac14Link(0.0) with { AmbientNoiseSpectralLevelDb = quiet, SelfNoiseSpectralLevelDb = 35.0 };
        Assert.True(quiet < 35.0);
        Approx.Abs(35.0 + (10.0 * Math.Log10(4000.0)), SonarEquation.Evaluate(link, 100.0).NoiseLevelDb, 1e-12, "floored NL");
    }

    [Fact]
    public void Maximum_range_sits_at_zero_margin()
    {
        var link = Ac14Link(0.0) with { DetectionThresholdDb = 10.0 };
        var range = SonarEquation.MaximumRange(link, 100e3);
        Assert.False(range.LimitedBySearch);
        Approx.Abs(0.0, SonarEquation.Evaluate(link, range.RangeM).MarginDb, 1e-6, "margin at range");
        Assert.True(SonarEquation.Evaluate(link, range.RangeM * 1.01).MarginDb < 0.0);
        Assert.True(range.RangeM > 5000.0, "AC-14 shows 39 dB SNR at 5 km, so a 10 dB threshold is met beyond it");
        Assert.True(SonarEquation.MaximumRange(link, 2000.0).LimitedBySearch);
        Assert.Equal(0.0, SonarEquation.MaximumRange(link with { SourceLevelDb = 60.0 }, 1e4).RangeM);
    }

    [Fact]
    public void Outside_the_fits_the_models_refuse()
    {
        var e = Assert.ThrowsAny<ArgumentOutOfRangeException>(() => SeawaterAbsorption.FrancoisGarrisonDbPerKm(10e3, ZeroCelsiusK + 25.0, 35.0, 0.0, 8.0));
        Assert.Equal("temperatureK", e.ParamName);
        Assert.ThrowsAny<ArgumentOutOfRangeException>(() => SeawaterAbsorption.AinslieMcColmDbPerKm(10e3, ZeroCelsiusK, 2.0, 0.0, 8.0));
        Assert.ThrowsAny<ArgumentOutOfRangeException>(() => SeawaterAbsorption.ThorpDbPerKm(100e3));
        Assert.ThrowsAny<ArgumentOutOfRangeException>(() => TransmissionLoss.PowerLawDb(0.5, 2.0, 1.0));
        Assert.ThrowsAny<ArgumentOutOfRangeException>(() => TransmissionLoss.PowerLawDb(10.0, 2.5, 1.0));
    }
}
