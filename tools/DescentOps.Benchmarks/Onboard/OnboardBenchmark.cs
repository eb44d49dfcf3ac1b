using System.Diagnostics;
using System.Globalization;
using DescentOps.Mission.Running;
using DescentOps.Records;
using DescentOps.Scenarios;
using DescentOps.Scenarios.Loading;
using DescentOps.Scenarios.Model;

namespace DescentOps.Benchmarks.Onboard;

/// <summary>
/// What on-board sampling apart from the frames costs. A year-long mission (the default with a 10 km shell, frames
/// every 10 min) runs with one on-board rule set of limit, band, state and duration checks, (a) evaluated on the frames
/// and (b) on samples taken every second, with exact crossings, and (c) every second at samples; the ratio b/a is the
/// figure the design must keep under 2. Checks that need every sample (a rate, a step, a count of samples) are timed
/// apart, (d) against (a), over a shorter stretch, since each of their samples is a kernel event. Wall times are medians of
/// interleaved repeats in one process (actor kernel, no log).
/// </summary>
public static class OnboardBenchmark
{
    public static async Task<int> RunAsync(TextWriter output, int repeats)
    {
        var c = CultureInfo.InvariantCulture;
        var frames = Load(Year(LimitRules), null);
        var exact = Load(Year(LimitRules), "onboard_sampling:\n  interval: 1 s\n");
        var atSamples = Load(Year(LimitRules), "onboard_sampling:\n  interval: 1 s\n  crossings: at_samples\n");
        await MissionRunner.RunAsync(exact, 1, 30 * 86_400, NullJournalSink.Instance, KernelChoice.Actors).ConfigureAwait(false);

        var times = await Interleaved([frames, exact, atSamples], 365 * 86_400.0, repeats).ConfigureAwait(false);
        output.WriteLine(string.Create(c, $"a simulated year, frames every 10 min, {LimitRules.Length} on-board rules (limits, bands, states, durations); actor kernel, no log, median of {repeats} interleaved repeats:"));
        output.WriteLine(string.Create(c, $"  (a) rules on the frames:                    {times[0]:F2} s"));
        output.WriteLine(string.Create(c, $"  (b) sampled every 1 s, exact crossings:      {times[1]:F2} s   ratio b/a {times[1] / times[0]:F2} (must be at most 2)"));
        output.WriteLine(string.Create(c, $"  (c) sampled every 1 s, crossings at samples: {times[2]:F2} s   ratio c/a {times[2] / times[0]:F2}"));

        const double stretchS = 3 * 86_400.0;
        var perSampleFrames = Load(Year(PerSampleRules), null);
        var perSample = Load(Year(PerSampleRules), "onboard_sampling:\n  interval: 1 s\n");
        var stretch = await Interleaved([perSampleFrames, perSample], stretchS, repeats).ConfigureAwait(false);
        output.WriteLine();
        output.WriteLine(string.Create(c, $"checks that need every sample (rate, step, count of samples), the first {stretchS / 86_400:F0} simulated days:"));
        output.WriteLine(string.Create(c, $"  (a') on the frames: {stretch[0]:F2} s; (d) sampled every 1 s: {stretch[1]:F2} s; ratio d/a' {stretch[1] / stretch[0]:F1}"));
        output.WriteLine(string.Create(c, $"  that is {stretch[1] / (stretchS / 86_400) * 365:F0} s for a year of such checks at 1 s: sample those points at a coarser interval (onboard_sampling.points)"));
        return 0;
    }

    private static async Task<double[]> Interleaved(Scenario[] scenarios, double untilS, int repeats)
    {
        var times = scenarios.Select(_ => new List<double>()).ToArray();
        for (var r = 0; r < repeats; r++)
        {
            for (var i = 0; i < scenarios.Length; i++)
            {
                var watch = Stopwatch.StartNew();
                await MissionRunner.RunAsync(scenarios[i], scenarios[i].Run.Seed, untilS, NullJournalSink.Instance, KernelChoice.Actors).ConfigureAwait(false);
                times[i].Add(watch.Elapsed.TotalSeconds);
            }
        }

        return [.. times.Select(t => t.Order().ElementAt(t.Count / 2))];
    }

    private static Scenario Load(string text, string? sampling) =>
        ScenarioLoader.LoadText(sampling is null ? text : text.Replace("\nrun:", "\n" + sampling + "\nrun:", StringComparison.Ordinal), "onboard-bench.yaml");

    /// <summary>The default mission with a 10 km shell, so the descent outlasts the year, and the given on-board rules.</summary>
    private static string Year(string[] rules) => BuiltInScenarios.Text(BuiltInScenarios.DefaultName)
        .Replace("  thickness: 2.5 km", "  thickness: 10 km", StringComparison.Ordinal)
        .Replace("  length: 3.2 km", "  length: 12 km", StringComparison.Ordinal)
        .Replace("  until: 400 d", "  until: 365 d", StringComparison.Ordinal)
        .Replace("\nrun:", "\nrules: |\n  autonomy E3\n" + string.Join("\n", rules.Select((r, i) => $"  rule r{i:00} {{ runs on board severity low priority {i} cooldown 1 h when {r} then {{ send probe.head set_power(power = 6 kW) }} }}")) + "\n\nrun:", StringComparison.Ordinal);

    /// <summary>A flight-like set of limit checks over the probe's points; each command restates the nominal head power.</summary>
    private static readonly string[] LimitRules =
    [
        "probe.depth above 1 km",
        "probe.depth above 5 km",
        "probe.ice_temperature above 250 K for 10 min",
        "probe.tilt outside -3 deg to 3 deg",
        "probe.velocity below 1 mm/h for 30 min",
        "probe.head_power below 5 kW",
        "probe.wall_power below 1 kW",
        "probe.energy_used above 100000 kWh",
        "probe.buffer_fill above 50 %",
        "probe.regime is Stopped for 1 h",
        "probe.depth inside 2 km to 2.1 km and probe.regime is Melting",
        "probe.bus_power_available below 100 W",
    ];

    private static readonly string[] PerSampleRules =
    [
        "rate of probe.depth over 1 h above 100 m/h",
        "step of probe.tilt above 1 deg",
        "probe.ice_temperature above 272 K for 3 samples",
    ];
}
