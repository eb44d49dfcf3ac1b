using DescentOps.Physics.Station;
using Xunit;

namespace DescentOps.Physics.Tests.Station;

public class StationTests
{
    private const double Au = LightTime.AstronomicalUnitM;
    private const double Deg = Math.PI / 180.0;

    [Fact]
    public void Light_times()
    {
        // DS-1, DS-2 CALC (reference note); AU exact (IAU 2012).
        Approx.Abs(499.0048, LightTime.OneWayS(Au), 1e-4, "per AU");
        Approx.Abs(32.85, LightTime.OneWayS(3.95 * Au) / 60.0, 0.01, "3.95 AU");
        Approx.Abs(43.25, LightTime.OneWayS(5.20 * Au) / 60.0, 0.01, "5.20 AU");
        Approx.Abs(53.73, LightTime.OneWayS(6.46 * Au) / 60.0, 0.01, "6.46 AU");
    }

    [Fact]
    public void Visibility_geometry_check_values()
    {
        // DS-3..DS-6 CALC; example orbit and planet radius from memory in the note.
        Approx.Abs(11.09, EarthVisibility.MaximumEarthElongationRad(5.2 * Au) / Deg, 0.01, "DS-3");
        Approx.Abs(6.115, Math.Asin(71_492.0 / 671_100.0) / Deg, 1e-3, "DS-4");
        var hidden = EarthVisibility.OccultationPerOrbitS(85.228 * 3600.0, 71_492e3, 671_100e3);
        Approx.Abs(2.90, hidden / 3600.0, 0.01, "DS-5 h");
        Approx.Abs(3.40, hidden / (85.228 * 3600.0) * 100.0, 0.01, "DS-5 %");
        Approx.Abs(0.4444, EarthVisibility.InViewFraction(0.0, 0.0, 10 * Deg), 1e-4, "DS-6 equator");
        Approx.Abs(0.3871, EarthVisibility.InViewFraction(60 * Deg, 0.0, 10 * Deg), 1e-4, "DS-6 60°");
        // With no mask and Earth on the equator every latitude sees it half the time; at the pole with the mask it never rises.
        Approx.Abs(0.5, EarthVisibility.InViewFraction(45 * Deg, 0.0, 0.0), 1e-12, "half");
        Assert.Equal(0.0, EarthVisibility.InViewFraction(85 * Deg, 0.0, 10 * Deg));
        Assert.Equal(1.0, EarthVisibility.InViewFraction(80 * Deg, 20 * Deg, 5 * Deg));
    }

    [Fact]
    public void Link_equation()
    {
        // DS-7, DS-8 CALC (reference note; inputs are assumptions).
        Approx.Abs(288.75, DeepSpaceLink.FreeSpaceLossDb(5.2 * Au, 8.4e9), 0.01, "DS-7");
        var lander = DeepSpaceLink.DishGainDbi(1.0, 8.4e9, 0.55);
        var ground = DeepSpaceLink.DishGainDbi(34.0, 8.4e9, 0.6);
        Approx.Abs(36.30, lander, 0.01, "1 m dish");
        Approx.Abs(67.30, ground, 0.01, "34 m dish");
        var rate = DeepSpaceLink.DataRateDbHz(20.0, lander, 1.0, 5.2 * Au, 8.4e9, ground, 40.0, 2.5, 3.0);
        Approx.Abs(33.94, rate, 0.05, "DS-8 dB-Hz");
        Approx.Rel(2.48e3, Math.Pow(10.0, rate / 10.0), 0.01, "DS-8 bit/s");
    }
}
