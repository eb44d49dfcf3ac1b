using DescentOps.Physics.Station;
using DescentOps.Scenarios.Model;

namespace DescentOps.Mission.Station;

/// <summary>
/// The station's link home for one scenario: the light time, the windows (null: always open) and how long one frame
/// takes on the air at the rate the link equation gives (zero when the scenario gives no radio).
/// </summary>
public sealed class HomeLink
{
    public HomeLink(Scenario scenario)
    {
        OneWayLightTimeS = LightTime.OneWayS(scenario.Body.DistanceToGroundM);
        if (scenario.Station.Link is not { } link) return;

        InViewFraction = EarthVisibility.InViewFraction(link.LatitudeRad, link.HomeDeclinationRad, link.ElevationMaskRad);
        OccultationPerTurnS = link.PlanetRadiusM is { } planet && link.OrbitRadiusM is { } orbit
            ? EarthVisibility.OccultationPerOrbitS(link.RotationPeriodS, planet, orbit)
            : 0.0;
        // The occultation lasts P·asin(R/a)/π, so the planet covers ±π·t_occ/P of hour angle.
        Windows = new HomeWindows(link.RotationPeriodS, InViewFraction * Math.PI, link.StartHourAngleRad, Math.PI * OccultationPerTurnS / link.RotationPeriodS, link.PlanetHourAngleRad);
        if (link.Radio is { } radio)
        {
            var stationGain = DeepSpaceLink.DishGainDbi(radio.DishDiameterM, radio.FrequencyHz, radio.DishEfficiency);
            var groundGain = DeepSpaceLink.DishGainDbi(radio.GroundDishDiameterM, radio.FrequencyHz, radio.GroundDishEfficiency);
            var rateDbHz = DeepSpaceLink.DataRateDbHz(radio.TransmitPowerW, stationGain, radio.LineLossDb, scenario.Body.DistanceToGroundM, radio.FrequencyHz, groundGain, radio.SystemNoiseTemperatureK, radio.RequiredEbN0Db, radio.MarginDb);
            DataRateBitPerS = Math.Pow(10.0, rateDbHz / 10.0);
            FrameTimeS = radio.FrameBits / DataRateBitPerS;
        }
    }

    public double OneWayLightTimeS { get; }

    public HomeWindows? Windows { get; }

    /// <summary>H0/π before the planet takes its share; 1 without link geometry.</summary>
    public double InViewFraction { get; } = 1.0;

    public double OccultationPerTurnS { get; }

    public double DataRateBitPerS { get; } = double.PositiveInfinity;

    public double FrameTimeS { get; }

    public bool IsOpen(double timeS) => Windows?.IsOpen(timeS) ?? true;

    public double NextOpeningS(double timeS) => Windows?.NextOpeningS(timeS) ?? timeS;

    public double ClosingS(double timeS) => Windows?.ClosingS(timeS) ?? double.PositiveInfinity;

    /// <summary>The first instant at or after <paramref name="timeS"/> when a whole frame fits in an open window.</summary>
    public double NextFrameStartS(double timeS)
    {
        var start = NextOpeningS(timeS);
        if (double.IsInfinity(start)) return start;
        var closing = ClosingS(start);
        if (closing >= start + FrameTimeS) return start;
        // A frame longer than a whole window would never go: at an opening it goes anyway and overruns the window.
        // "At an opening" allows a second: edges carry a few microseconds of rounding slack, and within a second of
        // the opening almost the whole window is still ahead, so a frame that does not fit then never fits.
        var atOpening = !IsOpen(start - 1.0);
        return atOpening ? start : NextOpeningS(closing + 1e-6);
    }
}
