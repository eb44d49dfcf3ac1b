using System.Diagnostics;
using System.Globalization;
using DescentOps.Primitives.Units;
using DescentOps.Records;
using DescentOps.Engine.Randomness;
using DescentOps.Mission.Running;
using DescentOps.Primitives.Identity;
using DescentOps.Primitives.Time;
using DescentOps.Rules.Catalogue;
using DescentOps.Rules.Checking;
using DescentOps.Rules.Evaluation;
using DescentOps.Rules.Text;
using DescentOps.Scenarios;
using DescentOps.Scenarios.Loading;

namespace DescentOps.Benchmarks.Rules;

/// <summary>
/// Whether rules dominate a run. Part 1 drives the rule evaluator alone with 50 rules over 30 telemetry points, one
/// sample of every point each simulated minute for a simulated year, and counts rule evaluations per second. Part 2
/// runs the mission itself for a simulated year at one frame a minute, with and without 50 rules over the probe's
/// points, and reports the ratio of wall times (measured side by side, interleaved, median of the repeats).
/// </summary>
public static class RulesBenchmark
{
    private const int Points = 30;
    private const int RuleCount = 50;
    private const int MinutesPerYear = 525_960;

    public static async Task<int> RunAsync(TextWriter output, int repeats)
    {
        var c = CultureInfo.InvariantCulture;
        EvaluatorAlone(output, c);
        await MissionYear(output, c, repeats).ConfigureAwait(false);
        return 0;
    }

    private static void EvaluatorAlone(TextWriter output, CultureInfo c)
    {
        var catalogue = new TelemetryCatalogue(
            Enumerable.Range(0, Points).Select(i => (TelemetryPointSpec)new NumericPointSpec(PointName(i), PhysicalDimension.Power, 0, 10_000)),
            [new CommandSpec(new ComponentId("bench"), "note", [])]);
        var text = string.Join("\n", Enumerable.Range(0, RuleCount).Select(SyntheticRule));
        var check = RuleChecker.CheckSource(new RuleSource("bench.dorules", text), catalogue);
        var rules = check.RuleSet ?? throw new InvalidOperationException("benchmark rules do not compile: " + string.Join("; ", check.Errors.Select(e => $"{e.Location}: {e.Message}")));
        var readers = new int[Points];
        for (var i = 0; i < RuleCount; i++)
        {
            foreach (var p in RulePoints(i)) readers[p]++;
        }

        var evaluator = new RuleEvaluator(rules, new RuleScheduler());
        var firings = 0;
        evaluator.Firings.Subscribe(_ => firings++);
        // Each point a bounded random walk around 5 kW, drawn before timing so that only the evaluator is timed.
        var random = new RandomStream(1, new ComponentId("bench"));
        var samples = new double[Points];
        Array.Fill(samples, 5000.0);
        var minutes = MinutesPerYear;
        var values = new double[minutes * Points];
        for (var m = 0; m < minutes; m++)
        {
            for (var p = 0; p < Points; p++)
            {
                samples[p] = Math.Clamp(samples[p] + random.NextNormal(0, 40), 0, 10_000);
                values[(m * Points) + p] = samples[p];
            }
        }

        var watch = Stopwatch.StartNew();
        long evaluations = 0;
        for (var m = 0; m < minutes; m++)
        {
            var t = SimTime.Epoch + SimDuration.FromMinutes(m);
            for (var p = 0; p < Points; p++)
            {
                evaluator.Submit(new TelemetrySample(PointName(p), t, new NumericValue(values[(m * Points) + p])));
                evaluations += readers[p];
            }
        }

        var seconds = watch.Elapsed.TotalSeconds;
        output.WriteLine(string.Create(c, $"rule evaluator alone: {RuleCount} rules over {Points} points, one sample a point a minute for a year"));
        output.WriteLine(string.Create(c, $"  {minutes * (long)Points:N0} samples, {evaluations:N0} rule evaluations, {firings:N0} firings in {seconds:F2} s wall"));
        output.WriteLine(string.Create(c, $"  {evaluations / seconds:N0} rule evaluations/s; {minutes * (long)Points / seconds:N0} samples/s; a simulated year of rules takes {seconds:F2} s"));
    }

    /// <summary>The mix of checks a real rule set has: limits, bands with persistence, rates, steps, combinations.</summary>
    private static string SyntheticRule(int i)
    {
        var p = PointName(i % Points);
        var q = PointName((i * 7 + 3) % Points);
        var condition = (i % 5) switch
        {
            0 => $"{p} above 9.5 kW",
            1 => $"{p} outside 1 kW to 9 kW for 3 samples",
            2 => $"rate of {p} over 1 h above 2 kW/h",
            3 => $"step of {p} below -150 W",
            _ => $"({p} above 8 kW and {q} below 2 kW) for 30 min",
        };
        return $"rule r{i:00} {{ runs on board severity low priority {i} cooldown 1 h when {condition} then {{ send bench note }} }}";
    }

    private static IEnumerable<int> RulePoints(int i) => i % 5 == 4 ? [i % Points, (i * 7 + 3) % Points] : [i % Points];

    private static string PointName(int i) => string.Create(CultureInfo.InvariantCulture, $"bench.x{i:00}");

    private static async Task MissionYear(TextWriter output, CultureInfo c, int repeats)
    {
        var year = YearAtOneMinute();
        var withRules = year.Replace("\nrun:", "\nrules: |\n" + string.Join("\n", MissionRules().Select(r => "  " + r)) + "\n\nrun:", StringComparison.Ordinal);
        var plain = ScenarioLoader.LoadText(year, "year.yaml");
        var ruled = ScenarioLoader.LoadText(withRules, "year-with-rules.yaml");
        await MissionRunner.RunAsync(plain, 1, 30 * 86_400, NullJournalSink.Instance, KernelChoice.Sequential).ConfigureAwait(false);

        var plainS = new List<double>();
        var ruledS = new List<double>();
        MissionSummary? last = null;
        for (var r = 0; r < repeats; r++)
        {
            var watch = Stopwatch.StartNew();
            await MissionRunner.RunAsync(plain, plain.Run.Seed, plain.Run.UntilS, NullJournalSink.Instance, KernelChoice.Actors).ConfigureAwait(false);
            plainS.Add(watch.Elapsed.TotalSeconds);
            watch.Restart();
            last = await MissionRunner.RunAsync(ruled, ruled.Run.Seed, ruled.Run.UntilS, NullJournalSink.Instance, KernelChoice.Actors).ConfigureAwait(false);
            ruledS.Add(watch.Elapsed.TotalSeconds);
        }

        var plainMedian = Median(plainS);
        var ruledMedian = Median(ruledS);
        output.WriteLine();
        output.WriteLine(string.Create(c, $"mission, a simulated year at one frame a minute (actor kernel, no log), median of {repeats} interleaved repeats:"));
        output.WriteLine(string.Create(c, $"  no rules: {plainMedian:F2} s; 50 rules (25 on board, 25 on the ground) over the probe's 8 points: {ruledMedian:F2} s"));
        output.WriteLine(string.Create(c, $"  rules cost {ruledMedian / plainMedian - 1:P0} of the run's wall time (ratio {ruledMedian / plainMedian:F2}); {last?.FramesSent:N0} frames"));
    }

    /// <summary>The default mission with a 10 km shell, so the descent outlasts the year, and a frame every minute.</summary>
    private static string YearAtOneMinute() => BuiltInScenarios.Text(BuiltInScenarios.DefaultName)
        .Replace("  thickness: 2.5 km", "  thickness: 10 km", StringComparison.Ordinal)
        .Replace("  length: 3.2 km", "  length: 12 km", StringComparison.Ordinal)
        .Replace("  telemetry_interval: 10 min", "  telemetry_interval: 1 min", StringComparison.Ordinal)
        .Replace("  until: 400 d", "  until: 365 d", StringComparison.Ordinal);

    /// <summary>
    /// 50 rules over the probe's points, half on board and half on the ground, that watch all year and fire rarely; their
    /// command restates the nominal head power, so a firing costs a command but leaves the descent unchanged.
    /// </summary>
    private static IEnumerable<string> MissionRules()
    {
        (string Point, string Above, string Band, string RateCheck, string Step)[] points =
        [
            ("probe.depth", "9.9 km", "1 km to 1.01 km", "rate of probe.depth over 1 h above 100 m/h", "10 m"),
            ("probe.velocity", "0.5 m/s", "1 mm/h to 2 mm/h", "rate of probe.depth over 6 h below 1 mm/h", "1 m/h"),
            ("probe.ice_temperature", "272 K", "150 K to 150.5 K", "rate of probe.ice_temperature over 1 h above 50 K/h", "20 K"),
            ("probe.head_power", "5.9 kW", "1 W to 2 W", "rate of probe.head_power over 1 h above 50 kW/h", "5 kW"),
            ("probe.wall_power", "2.9 kW", "1 W to 2 W", "rate of probe.wall_power over 1 h above 50 kW/h", "2.5 kW"),
            ("probe.energy_used", "100000 kWh", "1 kWh to 1.1 kWh", "rate of probe.energy_used over 1 h above 100 kWh/h", "10 kWh"),
            ("probe.tilt", "5 deg", "3 deg to 3.1 deg", "rate of probe.tilt over 1 h above 1 deg/h", "1 deg"),
        ];
        for (var i = 0; i < RuleCount; i++)
        {
            var (p, above, band, rateCheck, step) = points[i % points.Length];
            var condition = (i / points.Length % 5) switch
            {
                0 => $"{p} above {above}",
                1 => $"{p} inside {band} for 3 samples",
                2 => rateCheck,
                3 => $"step of {p} above {step}",
                _ => $"({p} above {above} and probe.regime is Melting) for 30 min",
            };
            var where = i % 2 == 0 ? "board" : "ground";
            yield return $"rule r{i:00} {{ runs on {where} severity low priority {i} cooldown 1 h when {condition} then {{ send probe.head set_power(power = 6 kW) }} }}";
        }
    }

    private static double Median(List<double> values)
    {
        var sorted = values.Order().ToList();
        return sorted[sorted.Count / 2];
    }
}
