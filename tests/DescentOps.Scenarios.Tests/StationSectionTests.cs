using DescentOps.Scenarios.Loading;
using DescentOps.Scenarios.Model;
using DescentOps.Tests.Shared;

namespace DescentOps.Scenarios.Tests;

/// <summary>The station's optional parts: read into SI, absent means today's plain relay, and bad input is located.</summary>
public sealed class StationSectionTests
{
    private static ScenarioError SingleError(string text) => MalformedScenarioTests.SingleError(text);

    [Fact]
    public void The_fixture_reads_every_station_part_in_SI()
    {
        var station = ScenarioLoader.LoadText(ScenarioText.Default, "every-field.yaml").Station;
        // 0.2 Gy/d = 0.2 / 86 400 Gy/s; 260 h = 936 000 s; 2 kGy = 2000 Gy (unit arithmetic).
        Assert.Equal(0.2 / 86_400, station.Radiation!.SurfaceDoseRateGyPerS, 15);
        Assert.Equal(DoseFailureModel.Lognormal, station.Radiation.FailureModel);
        Assert.Equal(936_000.0, station.Link!.RotationPeriodS, 6);
        Assert.Equal(-30 * Math.PI / 180, station.Link.StartHourAngleRad, 12);
        Assert.Equal(4096, station.Link.Radio!.FrameBits);
        Assert.Equal(2000.0, station.Dwell!.DValueGy, 9);
        Assert.True(station.Charging!.QueueWhileRecovering);
        Assert.Equal(5000, station.FrameQueueCapacity);
    }

    [Fact]
    public void Without_the_parts_the_station_is_a_plain_relay()
    {
        var station = ScenarioLoader.LoadText(ScenarioText.RepositoryDefault, "default.yaml").Station;
        Assert.Equal(new StationModel("Cairn", 2.0), station);
    }

    [Fact]
    public void A_dose_rate_without_a_time_is_refused_where_it_stands()
    {
        var text = ScenarioText.DefaultWith("    dose_rate: 0.2 Gy/d", "    dose_rate: 0.2 Gy");
        var error = SingleError(text);
        Assert.Equal("station.radiation.dose_rate", error.FieldPath);
        Assert.Equal(ScenarioText.LineOf(text, "dose_rate: 0.2 Gy"), error.Location.Line);
        Assert.Contains("not a dose rate", error.Message);
    }

    [Fact]
    public void A_planet_without_an_orbit_is_refused()
    {
        var text = ScenarioText.DefaultWith("    orbit_radius: 726000 km\n", "");
        var error = SingleError(text);
        Assert.Equal("station.link.orbit_radius", error.FieldPath);
        // A section is located where its mapping starts: the line of its first field.
        Assert.Equal(ScenarioText.LineOf(text, "  link:") + 1, error.Location.Line);
    }

    [Fact]
    public void A_Weibull_shape_outside_its_range_is_refused_at_the_field()
    {
        var text = TestScenario.Of(ScenarioText.Default, "every-field.yaml").Replace("    failure_model: lognormal", "    failure_model: weibull")
            .Replace("    failure_spread: 0.5\n", "    failure_spread: 0.05\n").Text;
        var error = SingleError(text);
        Assert.Equal("station.radiation.failure_spread", error.FieldPath);
        Assert.Equal(ScenarioText.LineOf(text, "failure_spread: 0.05"), error.Location.Line);
    }

    [Fact]
    public void A_dwell_needs_the_radiation_that_sterilises()
    {
        var fixture = ScenarioText.Default;
        var start = fixture.IndexOf("  radiation:\n", StringComparison.Ordinal);
        var end = fixture.IndexOf("  link:\n", StringComparison.Ordinal);
        var text = fixture[..start] + fixture[end..];
        var error = SingleError(text);
        Assert.Equal("station.dwell", error.FieldPath);
        Assert.Equal(ScenarioText.LineOf(text, "  dwell:") + 1, error.Location.Line);
    }
}
