using System.Text.RegularExpressions;
using DescentOps.Scenarios.Model;

namespace DescentOps.Scenarios.Tests;

/// <summary>
/// The built-in scenarios are an invented mission: no name of a real body, mission or probe concept, and no figure
/// close to a real icy moon's. The lists below are from memory (general planetary-science knowledge, rounded), which is
/// enough for a check that the demo keeps well away from them.
/// </summary>
public sealed partial class DemoNamesTests
{
    // Moons, planets and dwarf planets, flown or proposed missions, and published melt-probe and under-ice vehicle
    // concepts, lower case.
    private static readonly HashSet<string> RealNames = new(StringComparer.OrdinalIgnoreCase)
    {
        "europa", "enceladus", "ganymede", "callisto", "titan", "triton", "io", "dione", "rhea", "tethys", "mimas",
        "iapetus", "miranda", "ariel", "umbriel", "titania", "oberon", "charon", "pluto", "ceres", "eris", "makemake",
        "jupiter", "saturn", "uranus", "neptune", "mars", "venus", "mercury", "luna",
        "clipper", "juice", "dragonfly", "cassini", "huygens", "galileo", "voyager", "juno", "orpheus",
        "spindle", "icemole", "valkyrie", "tunnelbot", "cryobot", "slush", "icediver", "philberth", "enex", "archimedes",
        "sunfish", "icefin", "endurance", "artemis", "bruie", "swim", "minnow", "teredo", "prime", "triple",
    };

    public static TheoryData<string> Names() => [.. BuiltInScenarios.Names];

    [Theory]
    [MemberData(nameof(Names))]
    public void No_invented_name_is_a_real_one(string name)
    {
        var scenario = Load(name);
        var names = new List<string> { scenario.Name, scenario.Body.Name, scenario.Body.Site, scenario.Probe.Name, scenario.Station.Name };
        names.AddRange(scenario.Vehicles.Select(v => v.Name));
        // The comment header names the mission too.
        names.AddRange(BuiltInScenarios.Text(name).Split('\n').Where(l => l.StartsWith('#')));
        foreach (var word in names.SelectMany(n => Word().Matches(n)).Select(m => m.Value))
        {
            Assert.DoesNotContain(word, RealNames);
        }
    }

    [Theory]
    [MemberData(nameof(Names))]
    public void The_body_s_figures_keep_away_from_real_icy_moons(string name)
    {
        var scenario = Load(name);
        // Surface gravity, m/s² (from memory): Europa 1.315, Ganymede 1.428, Callisto 1.235, Titan 1.352,
        // Triton 0.779, Enceladus 0.113, Titania 0.379, Oberon 0.346, Rhea 0.264, Dione 0.232.
        foreach (var g in new[] { 1.315, 1.428, 1.235, 1.352, 0.779, 0.113, 0.379, 0.346, 0.264, 0.232 })
        {
            Assert.False(Near(scenario.Body.GravityMPerS2, g, 0.15), $"gravity {scenario.Body.GravityMPerS2} m/s² is within 15 % of a real moon's {g}");
        }

        // Earth distance ranges of the giant planets, km (from memory, rounded outward): a demo home must lie outside.
        foreach (var (low, high) in new[] { (5.8e8, 9.7e8), (1.19e9, 1.67e9), (2.57e9, 3.16e9), (4.3e9, 4.69e9) })
        {
            var km = scenario.Body.DistanceToGroundM / 1000;
            Assert.False(km >= low && km <= high, $"distance home {km} km lies in a giant planet's range {low}-{high} km");
        }

        if (scenario.Station.Link is not { } link) return;
        // Rotation (= orbital) periods of tidally locked icy moons, hours (from memory).
        foreach (var hours in new[] { 85.2, 171.7, 400.5, 382.7, 141.0, 32.9, 45.3, 65.7, 108.4, 22.6, 33.9, 60.5, 99.5, 208.9, 323.1, 153.3 })
        {
            Assert.False(Near(link.RotationPeriodS / 3600, hours, 0.15), $"rotation period {link.RotationPeriodS / 3600} h is within 15 % of a real moon's {hours} h");
        }

        // Equatorial radii of the giant planets, km (from memory): Jupiter 71 492, Saturn 60 268, Uranus 25 559, Neptune 24 764.
        if (link.PlanetRadiusM is { } radius)
        {
            foreach (var km in new[] { 71_492.0, 60_268.0, 58_232.0, 25_559.0, 24_764.0 })
            {
                Assert.False(Near(radius / 1000, km, 0.15), $"parent planet radius {radius / 1000} km is within 15 % of a real planet's {km} km");
            }
        }
    }

    private static bool Near(double value, double reference, double fraction) => Math.Abs(value - reference) <= fraction * reference;

    private static Scenario Load(string name) => Loading.ScenarioLoader.LoadText(BuiltInScenarios.Text(name), name);

    [GeneratedRegex("[A-Za-z]+", RegexOptions.CultureInvariant)]
    private static partial Regex Word();
}
