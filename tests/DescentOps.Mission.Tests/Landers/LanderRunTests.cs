using DescentOps.Mission.Running;
using DescentOps.Records;
using DescentOps.Scenarios.Loading;

namespace DescentOps.Mission.Tests.Landers;

/// <summary>
/// Runs with several landers: each lander's components have ids of their own and sign every record with the lander's
/// name; landers that never interact each run exactly the physics they run alone; both kernels write the same bytes.
/// </summary>
public sealed class LanderRunTests
{
    private static readonly string[] LanderNames = ["tarn", "brack"];

    [Fact]
    public async Task Every_record_of_a_lander_s_component_starts_with_the_lander_s_name()
    {
        var scenario = ScenarioLoader.LoadText(LanderTexts.Two(days: 1), "two.yaml");
        var (_, sink) = await MissionHarness.RunAsync(scenario);

        Assert.NotEmpty(sink.Records);
        foreach (var record in sink.Records.Where(r => r.Kind != "run.inputs"))
        {
            var lander = record.Source.Name.Split('/')[0];
            Assert.Contains(lander, LanderNames);
            Assert.Equal(LanderTagSink.Field, record.Fields[0].Name);
            Assert.Equal(lander, record.Fields[0].Text);
        }

        // Both landers ran their probe, tether and station, and tarn its vehicle, each under its own id.
        var sources = sink.Records.Select(r => r.Source.Name).ToHashSet(StringComparer.Ordinal);
        Assert.Superset(new HashSet<string>(["tarn/probe", "tarn/station", "tarn/tether", "tarn/ground", "brack/probe", "brack/station", "brack/tether"], StringComparer.Ordinal), sources);
        Assert.DoesNotContain("probe", sources);
    }

    [Theory]
    [InlineData("tarn", "Tarn Flats", false)]
    [InlineData("brack", "Brack Hollow", true)]
    public async Task A_lander_that_never_meets_the_other_runs_exactly_its_single_lander_physics(string lander, string site, bool withFault)
    {
        const double Days = 2;
        var parts = lander == "tarn" ? LanderTexts.TarnParts : LanderTexts.BrackParts;
        var alone = ScenarioLoader.LoadText(LanderTexts.Single(site, parts, withFault, Days), "alone.yaml");
        var together = ScenarioLoader.LoadText(LanderTexts.Two(Days), "two.yaml");

        var (_, single) = await MissionHarness.RunAsync(alone);
        var (_, both) = await MissionHarness.RunAsync(together);

        // The probe, its tether and its station: the same records at the same instants with the same values; the
        // multi-lander records carry the lander's name first.
        foreach (var part in new[] { "probe", "tether", "station", "fault-injector" })
        {
            var expected = single.Records.Where(r => r.Source.Name == part).Select(Line).ToList();
            // A fault's record names the component it strikes by id, which is the lander's own ("brack/probe").
            var actual = both.Records.Where(r => r.Source.Name == $"{lander}/{part}").Select(r => Line(r with { Fields = [.. r.Fields.Skip(1)] }).Replace($"target={lander}/", "target=", StringComparison.Ordinal)).ToList();
            Assert.Equal(expected, actual);
        }

        Assert.True(single.Records.Count(r => r.Kind == "probe.telemetry") >= 2 * 24 * 4, "two days of frames at 10 or 15 min");
    }

    [Fact]
    public async Task Both_kernels_write_the_same_bytes_for_a_run_with_landers()
    {
        var scenario = ScenarioLoader.LoadText(LanderTexts.Two(days: 1), "two.yaml");
        var sequential = await MissionHarness.JournalBytesAsync(scenario, scenario.Run.Seed, KernelChoice.Sequential);
        var actors = await MissionHarness.JournalBytesAsync(scenario, scenario.Run.Seed, KernelChoice.Actors);
        Assert.True(sequential.Length > 100_000, "a day of two landers' frames");
        Assert.Equal(sequential, actors);
    }

    private static string Line(JournalRecord r) =>
        $"{r.Time.SecondsSinceEpoch:R} {r.Kind} {r.Severity} {string.Join(' ', r.Fields.Select(f => f.ToString()))}";
}
