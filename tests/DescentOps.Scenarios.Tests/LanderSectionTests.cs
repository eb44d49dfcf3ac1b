using DescentOps.Scenarios.Format;
using DescentOps.Scenarios.Loading;

namespace DescentOps.Scenarios.Tests;

/// <summary>
/// The landers list: each lander a complete single-lander scenario of its own (its view) at its site, the present
/// format one lander, and every bad lander block refused at its file, line and field.
/// </summary>
public sealed class LanderSectionTests
{
    private static string TwoLanders => File.ReadAllText(Path.Combine(AppContext.BaseDirectory, "Fixtures", "two-landers.yaml"));

    private static string TwoLandersWith(string line, string replacement)
    {
        var text = TwoLanders;
        Assert.Contains(line, text);
        return text.Replace(line, replacement, StringComparison.Ordinal);
    }

    private static ScenarioError SingleError(string text) => MalformedScenarioTests.SingleError(text);

    [Fact]
    public void A_scenario_without_a_landers_list_is_one_lander_as_before()
    {
        var scenario = ScenarioLoader.LoadText(ScenarioText.Default, "every-field.yaml");
        Assert.Empty(scenario.Landers);
        Assert.Equal("Wendlow", scenario.Probe.Name);
    }

    [Fact]
    public void Each_lander_is_read_with_its_own_probe_station_vehicles_and_faults()
    {
        var scenario = ScenarioLoader.LoadText(TwoLanders, "two-landers.yaml");
        Assert.Equal(["tarn", "brack"], scenario.Landers.Select(l => l.Name));
        var (tarn, brack) = (scenario.Landers[0].View, scenario.Landers[1].View);
        Assert.Equal(("Wendlow", "Cairn", "Tarn Flats"), (tarn.Probe.Name, tarn.Station.Name, tarn.Body.Site));
        Assert.Equal(("Sallow", "Rook", "Brack Hollow"), (brack.Probe.Name, brack.Station.Name, brack.Body.Site));
        // 15 min = 900 s; 5 kW = 5000 W (unit arithmetic).
        Assert.Equal(900.0, brack.Probe.TelemetryIntervalS);
        Assert.Equal(5000.0, brack.Probe.HeadPowerW);
        Assert.Equal(["wisp-1"], tarn.Vehicles.Select(v => v.Name));
        Assert.Empty(brack.Vehicles);
        // The fault names brack, so only brack's view holds it; the whole scenario lists it too.
        Assert.Empty(tarn.Faults);
        Assert.Equal(["bus-sag-day-1"], brack.Faults.Select(f => f.Name));
        Assert.Equal(["bus-sag-day-1"], scenario.Faults.Select(f => f.Name));
        // A lander's own rules replace the top level's (the fixture has none at the top).
        Assert.True(tarn.Rules.IsEmpty);
        Assert.Contains("rook-slow", brack.Rules.Text);
        // A view is a single-lander scenario: it has no landers of its own.
        Assert.Empty(brack.Landers);
    }

    [Fact]
    public void The_site_sets_the_station_s_latitude_and_turns_its_hour_angles_by_the_longitude()
    {
        var brack = ScenarioLoader.LoadText(TwoLanders, "two-landers.yaml").Landers[1];
        var link = brack.View.Station.Link!;
        const double Degree = Math.PI / 180;
        Assert.Equal(-30 * Degree, brack.LatitudeRad, 12);
        Assert.Equal(-30 * Degree, link.LatitudeRad, 12);
        // Local hour angle = hour angle at longitude 0 + east longitude (the sidereal-time relation of spherical
        // astronomy): 160 deg + 40 deg and 5 deg + 40 deg.
        Assert.Equal(200 * Degree, link.StartHourAngleRad, 12);
        Assert.Equal(45 * Degree, link.PlanetHourAngleRad, 12);
    }

    [Fact]
    public void Two_landers_with_one_name_are_refused_at_the_second_name()
    {
        var text = TwoLandersWith("  - name: brack", "  - name: tarn");
        var error = SingleError(text);
        Assert.Equal("landers[1].name", error.FieldPath);
        Assert.Equal(NthLineOf(text, "  - name: tarn", 2), error.Location.Line);
        Assert.Contains("two entries", error.Message);
    }

    [Fact]
    public void More_than_four_landers_are_refused()
    {
        var text = TwoLanders;
        var start = text.IndexOf("  - name: brack", StringComparison.Ordinal);
        var end = text.IndexOf("\nfaults:", StringComparison.Ordinal);
        var brack = text[start..end].TrimEnd('\n') + "\n";
        var more = string.Concat(Enumerable.Range(3, 3).Select(n => brack.Replace("  - name: brack", $"  - name: brack-{n}", StringComparison.Ordinal)));
        var five = text.Insert(end + 1, more);
        var exception = Assert.Throws<ScenarioException>(() => ScenarioLoader.LoadText(five, "five.yaml"));
        Assert.Contains(exception.Errors, e => e.FieldPath == "landers" && e.Message.Contains($"{LanderFormat.MaxLanders}", StringComparison.Ordinal));
    }

    [Fact]
    public void A_probe_at_the_top_level_beside_landers_is_refused_where_it_stands()
    {
        var text = TwoLandersWith("landers:\n", "probe:\n  name: Stray\n  radius: 12 cm\n  length: 2 m\n  mass: 200 kg\n  head_power: 5 kW\n  wall_power: 5 kW\n  electronics_power: 50 W\n  telemetry_interval: 10 min\n\nlanders:\n");
        var error = SingleError(text);
        Assert.Equal("probe", error.FieldPath);
        Assert.Equal(ScenarioText.LineOf(text, "  name: Stray"), error.Location.Line);
        Assert.Contains("belongs inside each lander", error.Message);
    }

    [Fact]
    public void With_two_landers_a_fault_must_name_its_lander()
    {
        var text = TwoLandersWith("    lander: brack\n", "");
        var error = SingleError(text);
        Assert.Equal("faults[0].lander", error.FieldPath);
        Assert.Equal(ScenarioText.LineOf(text, "  - name: bus-sag-day-1"), error.Location.Line);
    }

    [Fact]
    public void A_fault_naming_no_lander_of_the_scenario_is_refused()
    {
        var text = TwoLandersWith("    lander: brack", "    lander: fell");
        var error = SingleError(text);
        Assert.Equal("faults[0].lander", error.FieldPath);
        Assert.Equal(ScenarioText.LineOf(text, "lander: fell"), error.Location.Line);
        Assert.Contains("no lander named 'fell'", error.Message);
    }

    [Fact]
    public void A_fault_of_a_scenario_without_landers_may_not_name_one()
    {
        var text = ScenarioText.DefaultWith("    kind: power_dip", "    kind: power_dip\n    lander: tarn");
        var error = SingleError(text);
        Assert.Equal("faults[0].lander", error.FieldPath);
        Assert.Contains("no 'landers' list", error.Message);
    }

    [Fact]
    public void A_bad_field_in_a_lander_is_located_in_the_lander()
    {
        var text = TwoLandersWith("      radius: 10 cm", "      radius: 10 kg");
        var error = SingleError(text);
        Assert.Equal("landers[1].probe.radius", error.FieldPath);
        Assert.Equal(ScenarioText.LineOf(text, "radius: 10 kg"), error.Location.Line);
    }

    [Fact]
    public void A_cross_field_error_of_a_lander_s_fault_keeps_the_fault_s_place_in_the_file()
    {
        // A power_dip needs a duration: the check of the single-lander format, run on brack's view.
        var text = TwoLandersWith("    duration: 12 h\n", "");
        var error = SingleError(text);
        Assert.Equal("faults[0].duration", error.FieldPath);
        Assert.Equal(ScenarioText.LineOf(text, "  - name: bus-sag-day-1"), error.Location.Line);
    }

    [Fact]
    public void A_lander_s_station_link_takes_no_latitude_of_its_own()
    {
        var text = TwoLandersWith("        elevation_mask: 10 deg", "        latitude: 5 deg\n        elevation_mask: 10 deg");
        var error = SingleError(text);
        Assert.Equal("landers[1].station.link.latitude", error.FieldPath);
        Assert.Equal(ScenarioText.LineOf(text, "latitude: 5 deg"), error.Location.Line);
    }

    [Fact]
    public void A_station_link_without_landers_still_needs_its_latitude()
    {
        var text = ScenarioText.Default;
        var latitude = text.Split('\n').Single(l => l.TrimStart().StartsWith("latitude:", StringComparison.Ordinal));
        var error = SingleError(text.Replace(latitude + "\n", "", StringComparison.Ordinal));
        Assert.Equal("station.link.latitude", error.FieldPath);
    }

    [Fact]
    public void A_scenario_with_neither_a_probe_nor_landers_is_refused()
    {
        var text = ScenarioText.RepositoryDefault;
        var start = text.IndexOf("probe:\n", StringComparison.Ordinal);
        var end = text.IndexOf("\ntether:", StringComparison.Ordinal);
        var error = SingleError(text.Remove(start, end - start));
        Assert.Equal("probe", error.FieldPath);
        Assert.Contains("landers", error.Message);
    }

    private static int NthLineOf(string text, string fragment, int n) =>
        text.Split('\n').Select((l, i) => (l, i)).Where(x => x.l.Contains(fragment, StringComparison.Ordinal)).ElementAt(n - 1).i + 1;
}
