using DescentOps.Primitives.Time;
using DescentOps.Rules.Evaluation;
using DescentOps.Rules.Syntax;
using DescentOps.Rules.Text;
using FsCheck;
using FsCheck.Fluent;
using FsCheck.Xunit;

namespace DescentOps.Rules.Tests;

/// <summary>Rule text made of the language's own words, numbers and punctuation, so that it reaches deep into the parser.</summary>
public sealed record TokenSoup(string Text);

/// <summary>Samples as (point index, time step in seconds, value); values include NaN, infinities and states.</summary>
public sealed record TelemetryScript(IReadOnlyList<(int Point, int StepS, double Value)> Samples);

public static class RuleArbitraries
{
    private static readonly string[] Tokens =
    [
        "rule", "r", "s", "{", "}", "(", ")", ",", "=", "runs", "on", "board", "ground", "severity", "high", "low",
        "priority", "3", "cooldown", "10", "min", "starts", "disabled", "when", "then", "escalate", "after", "send",
        "wait", "enable", "disable", "exclusive", "autonomy", "E2", "E3", "and", "or", "not", "above", "below",
        "inside", "outside", "to", "is", "rate", "of", "over", "step", "for", "samples", "probe.head_temp",
        "probe.depth", "probe.mode", "safe", "station.link", "down", "probe", "pause_descent", "probe.head",
        "set_power", "power", "2", "kW", "K", "°C", "m/h", "h", "-1", "1e999", "0", "2.5", "#", "\n", "probe.heater-3",
        "switch", "state", "off", "%", "$", "\"",
    ];

    public static Arbitrary<TokenSoup> Soup() =>
        Gen.Elements(Tokens).ListOf().Select(words => new TokenSoup(string.Join(" ", words))).ToArbitrary();

    public static Arbitrary<TelemetryScript> Script()
    {
        var value = Gen.Frequency(
            (8, Gen.Choose(0, 12_000).Select(v => v / 10.0)),
            (1, Gen.Elements(double.NaN, double.PositiveInfinity, double.NegativeInfinity, -5.0)));
        // Time steps of 0–600 s, and a few negative ones to exercise late samples.
        var sample = Gen.Choose(0, 6).Zip(Gen.Choose(-5, 600)).Zip(value, (pt, v) => (pt.Item1, pt.Item2, v));
        return sample.ListOf().Select(list => new TelemetryScript(list.ToArray())).ToArbitrary();
    }
}

[Properties(Arbitrary = [typeof(RuleArbitraries)], MaxTest = 300)]
public sealed class PropertyTests
{
    private static bool EveryErrorIsLocated(IEnumerable<RuleDiagnostic> diagnostics, string name, string? text)
    {
        // A location is inside the text, or one past its end: lines count the '\n's, plus one.
        var lines = (text ?? "").Count(c => c == '\n') + 1;
        return diagnostics.All(d => d.Location.Source == name && d.Location.Line >= 1 && d.Location.Line <= lines && d.Location.Column >= 1 && d.Message.Length > 0);
    }

    [Property]
    public bool Any_text_parses_to_a_tree_or_located_errors(string text)
    {
        var result = RuleParser.Parse(new RuleSource("fuzz.dorules", text));
        return result.RuleSet is not null && EveryErrorIsLocated(result.Errors, "fuzz.dorules", text);
    }

    [Property]
    public bool Any_text_checks_to_a_rule_set_or_located_errors(string text)
    {
        var result = RuleChecker(text);
        return (result.RuleSet is not null) != (result.Errors.Count > 0)
            && EveryErrorIsLocated(result.Errors.Concat(result.Warnings), "test.dorules", text);
    }

    [Property]
    public bool Language_shaped_text_checks_to_a_rule_set_or_located_errors(TokenSoup soup)
    {
        var result = RuleChecker(soup.Text);
        return (result.RuleSet is not null) != (result.Errors.Count > 0)
            && EveryErrorIsLocated(result.Errors.Concat(result.Warnings), "test.dorules", soup.Text);
    }

    private static Checking.RuleCheckResult RuleChecker(string? text) => TestCatalogue.Check(text!);

    private const string Rules = """
        rule hot { runs on board severity high priority 3 cooldown 5 min
          when (probe.head_temp above 420 K for 2 samples) or step of probe.head_temp above 50 K
          then { send probe.head set_power(power = 1 kW) wait 2 min send probe pause_descent }
          escalate after 10 min { send probe enter_safe_mode disable hot } }
        rule stall { runs on ground severity medium priority 3
          when (rate of probe.depth over 20 min below 0.5 m/h for 15 min) and not probe.mode is paused
          then { send probe.head set_power(power = 7 kW) enable hot } }
        rule link { runs on ground severity low
          when station.link is down for 3 samples
          then { send station drop_relay(relay = 2) } }
        exclusive probe.head (hot, stall)
        """;

    private static readonly string[] Points = ["probe.head_temp", "probe.depth", "probe.mode", "station.link", "probe.head_power", "unknown.point", "probe.descent_speed"];

    private static List<string> Run(TelemetryScript script)
    {
        var scheduler = new RuleScheduler();
        using var evaluator = new RuleEvaluator(TestCatalogue.Compile(Rules), scheduler);
        var outputs = new List<RuleOutput>();
        evaluator.Outputs.Subscribe(outputs.Add);
        var time = 0L;
        foreach (var (point, stepS, value) in script.Samples)
        {
            time += stepS * SimDuration.TicksPerSecond;
            TelemetryValue reading = point switch
            {
                2 => new DiscreteValue(value > 600 ? "paused" : "descending"),
                3 => new DiscreteValue(value > 600 ? "down" : "up"),
                _ => new NumericValue(value),
            };
            evaluator.Submit(new TelemetrySample(Points[point], new SimTime(time), reading));
        }

        evaluator.AdvanceTo(new SimTime(Math.Max(time, 0) + SimDuration.FromHours(2).Ticks));
        for (var i = 1; i < outputs.Count; i++)
        {
            Assert.True(outputs[i].Time >= outputs[i - 1].Time, "outputs go forward in time");
        }

        return outputs.Select(o => o.ToString()).ToList();
    }

    [Property]
    public bool Random_telemetry_never_throws_and_repeats_exactly(TelemetryScript script) =>
        Run(script).SequenceEqual(Run(script));

    [Property]
    public bool Every_sample_is_taken_ignored_or_rejected_with_an_event(TelemetryScript script)
    {
        // Count the samples the evaluator must refuse: late ones (time went backwards), non-finite numbers on
        // numeric points. Point 4, 5 and 6 are read by no rule, so they are ignored silently whatever they hold.
        var expectedRejections = 0;
        var clock = 0L;
        var time = 0L;
        foreach (var (point, stepS, value) in script.Samples)
        {
            time += stepS * SimDuration.TicksPerSecond;
            var read = point <= 3;
            if (time < clock)
            {
                expectedRejections++;
                continue;
            }

            if (read && point <= 1 && !double.IsFinite(value))
            {
                expectedRejections++;
            }

            clock = time;
        }

        var rejections = Run(script).Count(line => line.Contains(nameof(RuleEventKind.SampleRejected), StringComparison.Ordinal));
        return rejections == expectedRejections;
    }
}
