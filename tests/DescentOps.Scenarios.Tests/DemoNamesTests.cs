using System.Security.Cryptography;
using System.Text;
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
    // concepts (59 names, from memory), kept only as the first 16 hex digits of the SHA-256 of each lower-case name, so
    // that the project's own files never spell a real name while the check still catches one.
    private static readonly HashSet<string> RealNameDigests = new(StringComparer.Ordinal)
    {
        "04d52bfb8ce8b5a3", "1e9cc37678c0112d", "2725a1e33ec7b770", "2d1b3e45afe715aa", "30e94af4f02c42d2", "3daaec9e346786af",
        "3f89a8481b5b5804", "4021fadf187fd2c8", "40405cea63a5d1da", "40a7e9acb06295d6", "4737a15e2c762fa0", "4d9cb7a511c6f91c",
        "616bebcf52b9382c", "6736c93032321647", "67f70786288b7eea", "705553013b402905", "73c69af641302c6e", "8218d7171c3dd0b1",
        "849824d74c0f14ce", "86f3b26fbb067a10", "8a4262979b06fa58", "8c704e3a6730d565", "970ec274ca867815", "9ddc400d8b49efc7",
        "a21f28a4ac0b1de2", "a326860a4fe638dc", "a50128d59f482a86", "a5ad895656074bb1", "aa271fe768fa8d16", "aea96c13c0540a33",
        "b1cd9a6773f79ac9", "b2eb8398853615ed", "b515e89e9dac5fac", "b769a6983b42d565", "b78f00319bd91f39", "b7933ed6180d9e28",
        "b886fb7f1c248a67", "b8b22aedc372aa89", "b988b5837c24ad19", "bb0d0836e456258d", "be95e048ff6aaae6", "c48b4df565b0c96f",
        "c8ad3a2c773ce584", "cc50df82bcf43a7f", "d158be41db87d705", "d3f5633200f870d3", "d493f8869139bac7", "d67fb1bd67be7ec4",
        "d85647d35d468ffe", "dccc5d01dabcd1c0", "e2ca6aec52558fcc", "e58acc96c2b58b16", "e6e62ee55819cdc1", "edd0dfd02b346db0",
        "ee0a2783869f8fc5", "f20d1e52ecc10e31", "f59ac446633f08ca", "f787f3a50f8561a4", "fbf8a4a75beb40b2",
    };

    private static string Digest(string word) =>
        Convert.ToHexStringLower(SHA256.HashData(Encoding.UTF8.GetBytes(word.ToLowerInvariant())))[..16];

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
            Assert.False(RealNameDigests.Contains(Digest(word)), $"'{word}' is the name of a real body, mission or probe concept");
        }
    }

    [Theory]
    [MemberData(nameof(Names))]
    public void The_body_s_figures_keep_away_from_real_icy_moons(string name)
    {
        var scenario = Load(name);
        // Surface gravities of the ten largest icy moons, m/s² (from memory).
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

        // Equatorial radii of the giant planets (and one polar radius), km (from memory).
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
