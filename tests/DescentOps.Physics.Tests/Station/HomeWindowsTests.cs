using DescentOps.Physics.Station;
using Xunit;

namespace DescentOps.Physics.Tests.Station;

/// <summary>The home-link windows against hand computations of simple geometries.</summary>
public class HomeWindowsTests
{
    private const double Deg = Math.PI / 180.0;

    /// <summary>An invented 10-hour turn: round numbers make every window edge a whole number of hours.</summary>
    private const double PeriodS = 10 * 3600.0;

    [Fact]
    public void At_the_equator_with_no_mask_and_no_planet_home_is_up_half_of_each_turn()
    {
        // Computed: φ = 0, δ = 0, e = 0 give cos H0 = 0, H0 = π/2, so the in-view fraction is (π/2)/π = 1/2.
        var h0 = EarthVisibility.InViewFraction(0.0, 0.0, 0.0) * Math.PI;
        Approx.Abs(Math.PI / 2, h0, 1e-12, "H0");
        // Starting with home rising (hour angle −90°): open for the first half turn, closed for the second.
        var windows = new HomeWindows(PeriodS, h0, -90 * Deg, 0.0, 0.0);
        Approx.Abs(0.5, windows.OpenFraction, 1e-12, "open fraction");
        Assert.True(windows.IsOpen(0.0));
        Assert.True(windows.IsOpen((PeriodS / 2) - 1.0));
        Assert.False(windows.IsOpen((PeriodS / 2) + 1.0));
        Approx.Abs(PeriodS / 2, windows.ClosingS(0.0), 1e-6, "closes after half a turn");
        Approx.Abs(PeriodS, windows.NextOpeningS((PeriodS / 2) + 1.0), 1e-6, "opens again after a whole turn");
        Approx.Abs(3 * PeriodS, windows.NextOpeningS((2.5 * PeriodS) + 1.0), 1e-6, "and every turn after");
    }

    [Fact]
    public void The_planet_cuts_its_arc_out_of_the_window()
    {
        // Invented planet and orbit. The planet covers ±asin(R/a) of hour angle about the meridian, so the window
        // [−90°, 90°] loses 2·asin(R/a)/(2π) of the turn and splits in two about hour angle 0.
        const double planetM = 60_000e3, orbitM = 580_000e3;
        var half = Math.Asin(planetM / orbitM);
        var occultationS = EarthVisibility.OccultationPerOrbitS(PeriodS, planetM, orbitM);
        Approx.Abs(PeriodS * 2 * half / (2 * Math.PI), occultationS, 1e-6, "occultation length, P·asin(R/a)/π");
        var windows = new HomeWindows(PeriodS, Math.PI / 2, -90 * Deg, half, 0.0);
        Approx.Abs(0.5 - (occultationS / PeriodS), windows.OpenFraction, 1e-12, "open fraction");

        // Home reaches the planet's edge a quarter turn less the half-arc after rising, and comes out the arc later.
        var hiddenAtS = (PeriodS / 4) - (half / (2 * Math.PI) * PeriodS);
        Approx.Abs(hiddenAtS, windows.ClosingS(0.0), 1e-6, "hidden behind the planet");
        Assert.False(windows.IsOpen(PeriodS / 4));
        Approx.Abs(hiddenAtS + occultationS, windows.NextOpeningS(PeriodS / 4), 1e-6, "out from behind the planet");
        Approx.Abs(PeriodS / 2, windows.ClosingS(hiddenAtS + occultationS + 1.0), 1e-6, "then sets at −90° + 180°");
    }

    [Fact]
    public void Always_and_never_in_view_are_handled()
    {
        var always = new HomeWindows(PeriodS, Math.PI, 0.0, 0.0, 0.0);
        Assert.Equal(1.0, always.OpenFraction, 12);
        Assert.True(double.IsPositiveInfinity(always.ClosingS(123.0)));
        var never = new HomeWindows(PeriodS, 0.0, 0.0, 0.0, 0.0);
        Assert.False(never.IsOpen(0.0));
        Assert.True(double.IsPositiveInfinity(never.NextOpeningS(0.0)));
    }

    [Fact]
    public void A_window_that_spans_the_wrap_of_hour_angle_is_one_window()
    {
        // H0 = 120°, no planet: open from −120° to +120°, across hour angle 0 (= 2π); starting at −60° the window
        // closes after 180° of turn, half a period (computed).
        var windows = new HomeWindows(PeriodS, 120 * Deg, -60 * Deg, 0.0, 0.0);
        Approx.Abs(PeriodS / 2, windows.ClosingS(0.0), 1e-6, "closing");
        Approx.Abs(PeriodS * (2.0 / 3.0), windows.OpenFraction * PeriodS, 1e-6, "open share 240/360");
    }
}
