using System.Globalization;
using DescentOps.Records;
using DescentOps.Records.Kinds;
using DescentOps.Engine.Randomness;
using DescentOps.Primitives.Identity;
using DescentOps.Primitives.Time;
using DescentOps.Scenarios.Campaign;
using DescentOps.Scenarios.Loading;
using DescentOps.Scenarios.Model;
using MathNet.Numerics.Distributions;
using MathNet.Numerics.Random;

namespace DescentOps.Mission.Running;

/// <summary>
/// Draws a scenario's uncertain inputs for one run. The draws come from the run's own stream for the purpose
/// (component id <c>uncertain-inputs</c>, seeded like every component stream), in the order of the section, so the same
/// seed gives the same values and no other component's draws move. A draw outside the field's valid range is drawn
/// again (truncation). The drawn scenario is the scenario's text with the values written in, loaded again.
/// </summary>
public static class UncertainDraw
{
    public static readonly ComponentId StreamId = new("uncertain-inputs");

    /// <summary>Guards a truncation that leaves almost nothing of the distribution.</summary>
    private const int MaxRedraws = 10_000;

    public static (Scenario Scenario, IReadOnlyList<DrawnInput> Values) Draw(Scenario scenario, long seed)
    {
        if (scenario.Uncertain.Count == 0) return (scenario, []);
        var random = new Xoshiro256StarStar(RandomStream.DeriveSeed(seed, StreamId), threadSafe: false);
        var values = new List<DrawnInput>();
        for (var i = 0; i < scenario.Uncertain.Count; i++)
        {
            var input = scenario.Uncertain[i];
            var value = double.NaN;
            for (var attempt = 0; attempt < MaxRedraws && !input.InRange(value); attempt++) value = Sample(input, random);
            if (!input.InRange(value))
            {
                throw new ScenarioException([new ScenarioError(scenario.LocationOf($"uncertain[{i}].path"), $"uncertain[{i}].path",
                    $"'{input.Path}': {MaxRedraws} draws all fell outside the field's valid range; narrow the distribution")]);
            }

            values.Add(new DrawnInput(input.Path, value, input.Unit));
        }

        var patched = ScenarioPatch.Apply(scenario.SourceText, [.. values.Select(v => (v.Path, v.Text))]);
        var drawn = ScenarioLoader.LoadText(patched, scenario.SourceName);
        // The text is the scenario as written; a variant or a branch changed the rules, the fault list, the telecommands
        // and the rule uplinks after loading: those changes are kept (Kept), here and in each lander's view, from which
        // its components are built.
        var landers = drawn.Landers.Count == scenario.Landers.Count
            ? [.. drawn.Landers.Select((l, k) => l with { View = Kept(scenario.Landers[k].View, l.View) })]
            : drawn.Landers;
        return (Kept(scenario, drawn) with { SourceText = scenario.SourceText, Uncertain = scenario.Uncertain, Landers = landers }, values);
    }

    /// <summary>
    /// A drawn scenario with what a change did to the given one after loading kept: the rules as given, the faults in the
    /// given list (each with its drawn values if it has any), the text's telecommands (with any drawn times) and those a
    /// change added, and the rule uplinks (which only a change gives).
    /// </summary>
    private static Scenario Kept(Scenario given, Scenario drawn)
    {
        var faults = given.Faults.Select(f => drawn.Faults.FirstOrDefault(d => d.Name == f.Name && d.Kind == f.Kind) is { } d ? d : f).ToList();
        var added = given.Telecommands.Where(t => t.FieldPath.StartsWith("add_telecommands", StringComparison.Ordinal));
        return drawn with { Rules = given.Rules, Faults = faults, Telecommands = [.. drawn.Telecommands.Concat(added).OrderBy(t => t.AtS)], RuleUplinks = given.RuleUplinks };
    }

    /// <summary>The journal record of the draws, at the start of the run.</summary>
    public static JournalRecord Record(IReadOnlyList<DrawnInput> values) =>
        new(SimTime.Epoch, StreamId, RunRecords.InputsDrawn, Severity.Info, [.. values.Select(v => RecordField.Of(v.Path, v.ValueSi))]);

    private static double Sample(UncertainInput input, Xoshiro256StarStar random) => input.Distribution switch
    {
        UncertainDistribution.Normal => Normal.Sample(random, input.A, input.B),
        UncertainDistribution.LogNormal => LogNormal.Sample(random, input.A, input.B),
        UncertainDistribution.Uniform => ContinuousUniform.Sample(random, input.A, input.B),
        _ => Triangular.Sample(random, input.A, input.C, input.B),
    };
}

/// <summary>One drawn value in SI, with the SI symbol it is written with in the drawn scenario.</summary>
public sealed record DrawnInput(string Path, double ValueSi, string Unit)
{
    public string Text => Unit.Length == 0
        ? ValueSi.ToString("R", CultureInfo.InvariantCulture)
        : string.Create(CultureInfo.InvariantCulture, $"{ValueSi:R} {Unit}");
}
