using DescentOps.Primitives.Identity;
using DescentOps.Primitives.Units;
using DescentOps.Rules.Catalogue;
using DescentOps.Rules.Checking;
using DescentOps.Rules.Compiled;
using DescentOps.Rules.Evaluation;
using DescentOps.Rules.Syntax;
using DescentOps.Rules.Text;

namespace DescentOps.Rules.Tests;

/// <summary>
/// Lander-qualified points and targets ("north/probe.depth") and the difference of two points ("A minus B above Q"),
/// as a mission's rules across landers use them: parsed, checked against a catalogue that knows its landers, evaluated.
/// </summary>
public sealed class LanderComparisonTests
{
    /// <summary>Two invented landers, north and south, each with a depth (0–5000 m), a head temperature (0–1000 K), a head power and a mode.</summary>
    private static TelemetryCatalogue Catalogue { get; } = new(
        [.. new[] { "north", "south" }.SelectMany(l => new TelemetryPointSpec[]
        {
            new NumericPointSpec(l + "/probe.depth", PhysicalDimension.Length, 0.0, 5000.0),
            new NumericPointSpec(l + "/probe.head_temp", PhysicalDimension.Temperature, 0.0, 1000.0),
            new NumericPointSpec(l + "/probe.head_power", PhysicalDimension.Power, 0.0, 10_000.0),
            new DiscretePointSpec(l + "/probe.mode", ["descending", "paused"]),
        })],
        [.. new[] { "north", "south" }.Select(l => new CommandSpec(new ComponentId(l + "/probe.head"), "set_power", [new QuantityArgumentSpec("power", PhysicalDimension.Power, 0.0, 8000.0)]))])
    {
        Landers = new HashSet<string>(["north", "south"], StringComparer.Ordinal),
    };

    /// <summary>A ground rule whose condition starts at line 2, column 6 ("when " is five characters) and whose action is line 3.</summary>
    private static string Rule(string when, string then = "send south/probe.head set_power(power = 6 kW)") =>
        $"rule r {{ runs on ground severity high\nwhen {when}\nthen {{ {then} }} }}";

    private static RuleCheckResult Check(string text) => RuleChecker.CheckSource(new RuleSource("mission.dorules", text), Catalogue);

    private static void AssertSingleErrorAt(string text, DiagnosticCode code, int line, int column)
    {
        var result = Check(text);
        Assert.Null(result.RuleSet);
        var error = Assert.Single(result.Errors);
        Assert.Equal((code, line, column, "mission.dorules"), (error.Code, error.Location.Line, error.Location.Column, error.Location.Source));
    }

    [Fact]
    public void A_difference_of_two_landers_points_parses_with_both_names_and_the_threshold()
    {
        var parsed = RuleParser.Parse(new RuleSource("mission.dorules", Rule("north/probe.depth minus south/probe.depth above 20 m")));
        Assert.True(parsed.Succeeded, string.Join("\n", parsed.Errors));
        var difference = Assert.IsType<DifferenceCheckSyntax>(Assert.Single(parsed.RuleSet.Rules).Condition);
        Assert.Equal(("north/probe.depth", "south/probe.depth", Comparison.Above), (difference.Left.Text, difference.Right.Text, difference.Threshold.Kind));
        // "north/probe.depth minus " is 24 characters: the right point starts at column 6 + 24 = 30.
        Assert.Equal((2, 6, 30), (difference.Location.Line, difference.Location.Column, difference.Right.Location.Column));
    }

    [Fact]
    public void Minus_without_a_point_after_it_is_a_located_syntax_error()
    {
        // "north/probe.depth minus " is 24 characters: the number stands at column 30.
        AssertSingleErrorAt(Rule("north/probe.depth minus 20 m above 3 m"), DiagnosticCode.UnexpectedToken, 2, 30);
    }

    [Fact]
    public void A_difference_compiles_to_SI_and_a_temperature_difference_is_a_difference()
    {
        var result = Check(Rule("north/probe.head_temp minus south/probe.head_temp above 5 °C"));
        Assert.True(result.Succeeded, string.Join("\n", result.Errors));
        var condition = Assert.IsType<DifferenceCondition>(Assert.Single(result.RuleSet!.Rules).Condition);
        Assert.Equal(["north/probe.head_temp", "south/probe.head_temp"], condition.Points);
        // A difference of 5 °C is 5 K (not 278.15 K): the same rule as a step's (a Celsius interval equals a kelvin one: SI Brochure, 9th edition, 2.3.1, from memory).
        Assert.Equal(5.0, condition.Threshold.LowerSi, 12);
    }

    [Fact]
    public void An_unknown_lander_is_refused_at_its_point_and_at_its_target()
    {
        AssertSingleErrorAt(Rule("west/probe.depth minus south/probe.depth above 20 m"), DiagnosticCode.UnknownLander, 2, 6);
        // "then { send " is 12 characters: the target starts at column 13.
        AssertSingleErrorAt(Rule("north/probe.depth above 20 m", "send west/probe.head set_power(power = 6 kW)"), DiagnosticCode.UnknownLander, 3, 13);
        Assert.Contains("the landers are north, south", Check(Rule("west/probe.depth above 20 m")).Errors[0].Message);
    }

    [Fact]
    public void An_unknown_point_of_a_known_lander_and_an_unqualified_point_are_unknown_points()
    {
        AssertSingleErrorAt(Rule("north/probe.tail minus south/probe.depth above 20 m"), DiagnosticCode.UnknownPoint, 2, 6);
        AssertSingleErrorAt(Rule("probe.depth above 20 m"), DiagnosticCode.UnknownPoint, 2, 6);
    }

    [Fact]
    public void Points_of_different_dimensions_and_a_threshold_in_another_unit_are_unit_mismatches()
    {
        AssertSingleErrorAt(Rule("north/probe.depth minus south/probe.head_power above 20 m"), DiagnosticCode.UnitMismatch, 2, 30);
        // "... minus south/probe.depth above " is 24 + 18 + 6 = 48 characters: the quantity stands at column 54.
        AssertSingleErrorAt(Rule("north/probe.depth minus south/probe.depth above 20 kW"), DiagnosticCode.UnitMismatch, 2, 54);
        AssertSingleErrorAt(Rule("north/probe.mode minus south/probe.depth above 20 m"), DiagnosticCode.WrongPointKind, 2, 6);
    }

    [Fact]
    public void A_difference_holds_on_the_latest_sample_of_each_point_whenever_each_was_taken()
    {
        var result = Check(Rule("north/probe.depth minus south/probe.depth above 20 m"));
        var evaluator = new RuleEvaluator(result.RuleSet!, new RuleScheduler());
        var firings = new List<RuleFiring>();
        evaluator.Firings.Subscribe(firings.Add);
        static TelemetrySample Depth(string lander, double t, double m) => new(lander + "/probe.depth", Primitives.Time.SimTime.FromSecondsSinceEpoch(t), new NumericValue(m));

        // North alone at 100 m: no south reading yet, so no difference.
        evaluator.Submit([Depth("north", 10, 100)]);
        // South at 85 m: 15 m behind, not more than 20.
        evaluator.Submit([Depth("south", 20, 85)]);
        // North at 105.5 m against south's 85 m, still its latest: 20.5 m.
        evaluator.Submit([Depth("north", 30, 105.5)]);
        var firing = Assert.Single(firings);
        Assert.Equal(30.0, firing.Time.SecondsSinceEpoch);
        Assert.Equal(["north/probe.depth", "south/probe.depth"], firing.Evidence.Select(e => e.Point));
        Assert.Equal([105.5, 85.0], firing.Evidence.Select(e => ((NumericValue)e.Value).ValueSi));
        Assert.Equal("south/probe.head set_power(power=6000)", Assert.Single(firing.Commands).ToString());
    }
}
