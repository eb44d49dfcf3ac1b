using DescentOps.Physics.Links;
using FsCheck.Xunit;
using Xunit;

namespace DescentOps.Physics.Tests.Links;

public class IceRadioTests
{
    private const double MicroSiemensPerM = 1e-6;
    private const double MicroMolar = 1e-3; // mol/m³
    private static readonly IceConductivityParameters Std = IceConductivityParameters.MacGregor2007Standard;

    [Fact]
    public void Conversion_factor()
    {
        // RF-1 CALC of the MacGregor et al. 2007 formula (their ≈ 0.914 dB/km per µS/m for ε′ = 3.2).
        Approx.Abs(0.91462, IceRadioAttenuation.DbPerMPerSPerM(3.2) * 1e3 * MicroSiemensPerM, 1e-5, "3.2");
        Approx.Abs(0.92185, IceRadioAttenuation.DbPerMPerSPerM(3.15) * 1e3 * MicroSiemensPerM, 1e-5, "3.15");
    }

    // RF-2..RF-8 CALC (reference note) with the M07 parameter sets of MacGregor et al. 2007, Table 1 as averaged in the
    // first author's code.
    [Theory]
    [InlineData(251.0, 0.0, 0.0, 6.600, 6.036, 1e-3)]
    [InlineData(263.15, 0.0, 0.0, 21.35, 19.53, 0.01)]
    [InlineData(270.0, 0.0, 0.0, 39.51, 36.13, 0.01)]
    [InlineData(270.0, 0.0, 100.0, 119.29, 109.11, 0.02)]
    [InlineData(251.0, 1.0, 1.0, 10.23, 9.357, 1e-3)]
    public void M07_standard_check_values(double temperatureK, double hMicroMolar, double clMicroMolar, double sigmaMicroSPerM, double dbPerKm, double tolerance)
    {
        var chemistry = new IceImpurities(hMicroMolar * MicroMolar, clMicroMolar * MicroMolar, 0.0);
        Approx.Abs(sigmaMicroSPerM, IceElectricalConductivity.SPerM(temperatureK, Std, chemistry) / MicroSiemensPerM, tolerance, "sigma");
        Approx.Abs(dbPerKm, IceRadioAttenuation.DbPerM(temperatureK, Std, chemistry) * 1e3, tolerance, "N_a");
    }

    [Fact]
    public void Other_parameter_sets()
    {
        // RF-7 CALC (M07-adj) and RF-8 CALC (cold ice, nearly lossless).
        Approx.Abs(8.414, IceRadioAttenuation.DbPerM(251.0, IceConductivityParameters.MacGregor2007Adjusted, IceImpurities.None) * 1e3, 1e-3, "RF-7");
        Approx.Abs(0.01008, IceElectricalConductivity.SPerM(200.0, Std, IceImpurities.None) / MicroSiemensPerM, 1e-4, "RF-8");
        // Each Arrhenius term equals its prefactor at its reference temperature (W97: 258.15 K); the sum then is linear
        // in concentration with the set's molar conductivities: 9.0 + 4.0·1 + 0.55·2 + 1.0·3 µS/m.
        var w97 = IceElectricalConductivity.SPerM(258.15, IceConductivityParameters.Wolff1997, new IceImpurities(1 * MicroMolar, 2 * MicroMolar, 3 * MicroMolar));
        Approx.Rel(17.1, w97 / MicroSiemensPerM, 1e-12, "W97 at T_r");
    }

    [Fact]
    public void Shell_path_loss()
    {
        // RF-10 CALC: the k = a/T conductive profile T(z) = T_s (T_b/T_s)^(z/H), 100 K to 270 K over 10 km, M07-std pure.
        static double Profile(double z) => 100.0 * Math.Pow(2.7, z / 10e3);
        var total = IceRadioAttenuation.OneWayPathLossDb(Profile, 0.0, 10e3, Std, IceImpurities.None);
        var bottom = IceRadioAttenuation.OneWayPathLossDb(Profile, 9e3, 10e3, Std, IceImpurities.None);
        Approx.Abs(14.79, total, 0.02, "whole shell");
        Approx.Abs(13.65, bottom, 0.02, "bottom km");
        // Simpson is exact for a linear integrand: a uniform 251 K slab of 1 km loses N_a(251 K)·1 km.
        Approx.Rel(6.036, IceRadioAttenuation.OneWayPathLossDb(_ => 251.0, 0.0, 1e3, Std, IceImpurities.None, 2), 1e-3, "uniform slab");
    }

    private static IceRadioLink Rf12 => new(30.0, 0.0, 0.0, 100e6, 10e3, 5.0, 10.0, 6.0, 0.0, 3.2);

    [Fact]
    public void Relay_link_check_values()
    {
        // RF-11, RF-12 CALC (reference note).
        Approx.Abs(77.50, IceRadioLinkBudget.FreeSpaceLossDb(1e3, 100e6, 3.2), 0.01, "FSPL ice");
        Approx.Abs(72.45, IceRadioLinkBudget.FreeSpaceLossDb(1e3, 100e6, 1.0), 0.01, "FSPL vacuum");
        Approx.Abs(143.0, IceRadioLinkBudget.AllowedPathLossDb(Rf12), 1e-9, "allowed loss");
        Approx.Rel(7.92e3, IceRadioLinkBudget.MaximumSpacing(Rf12, 6e-3, 1e6).SpacingM, 0.01, "N_a 6");
        Approx.Rel(1.69e3, IceRadioLinkBudget.MaximumSpacing(Rf12, 36e-3, 1e6).SpacingM, 0.01, "N_a 36");
        Approx.Rel(0.632e3, IceRadioLinkBudget.MaximumSpacing(Rf12, 110e-3, 1e6).SpacingM, 0.01, "N_a 110");
        var r = IceRadioLinkBudget.MaximumSpacing(Rf12, 6e-3, 1e6);
        Approx.Abs(0.0, IceRadioLinkBudget.MarginDb(Rf12, r.SpacingM, 6e-3), 1e-6, "margin at range");
        Assert.True(IceRadioLinkBudget.MaximumSpacing(Rf12, 0.0, 1e3).LimitedBySearch);
    }

    [Property(MaxTest = 200)]
    public void Range_falls_as_the_ice_warms(ushort a, ushort b, ushort c)
    {
        // Warmer ice conducts more for every parameter set and chemistry, so the relay spacing must shrink.
        var cold = 150.0 + (120.0 * a / ushort.MaxValue);
        var warm = Math.Min(273.15, cold + 0.5 + (20.0 * b / ushort.MaxValue));
        var chemistry = new IceImpurities(0.0, 50.0 * MicroMolar * c / ushort.MaxValue, 0.0);
        var sets = new[] { Std, IceConductivityParameters.MacGregor2007Adjusted, IceConductivityParameters.Wolff1997 };
        var set = sets[c % 3];
        var near = IceRadioLinkBudget.MaximumSpacing(Rf12, IceRadioAttenuation.DbPerM(cold, set, chemistry), 1e7);
        var far = IceRadioLinkBudget.MaximumSpacing(Rf12, IceRadioAttenuation.DbPerM(warm, set, chemistry), 1e7);
        Assert.False(near.LimitedBySearch);
        Assert.True(far.SpacingM < near.SpacingM, FormattableString.Invariant($"{cold} K: {near.SpacingM} m, {warm} K: {far.SpacingM} m"));
    }

    [Fact]
    public void Outside_the_models_they_refuse()
    {
        var e = Assert.ThrowsAny<ArgumentOutOfRangeException>(() => IceElectricalConductivity.SPerM(274.0, Std, IceImpurities.None));
        Assert.Equal("temperatureK", e.ParamName);
        Assert.Contains("273.15", e.Message, StringComparison.Ordinal);
        Assert.ThrowsAny<ArgumentOutOfRangeException>(() => IceRadioLinkBudget.FreeSpaceLossDb(1e3, 5e9, 3.2));
        Assert.ThrowsAny<ArgumentOutOfRangeException>(() => IceRadioAttenuation.OneWayPathLossDb(_ => 250.0, 0.0, 10.0, Std, IceImpurities.None, 3));
    }
}
