using DescentOps.Primitives.Time;
using DescentOps.Rules.Evaluation;

namespace DescentOps.Rules.Tests;

/// <summary>Compiles rule text against the test catalogue and records every output of an evaluator.</summary>
internal sealed class EvaluatorHarness
{
    public EvaluatorHarness(string ruleText)
    {
        Scheduler = new RuleScheduler();
        Evaluator = new RuleEvaluator(TestCatalogue.Compile(ruleText), Scheduler);
        Evaluator.Outputs.Subscribe(Outputs.Add);
    }

    public RuleScheduler Scheduler { get; }

    public RuleEvaluator Evaluator { get; }

    public List<RuleOutput> Outputs { get; } = [];

    public IReadOnlyList<RuleFiring> Firings => Outputs.OfType<RuleFiring>().ToArray();

    public IReadOnlyList<RuleEvent> Events => Outputs.OfType<RuleEvent>().ToArray();

    public static SimTime At(double seconds) => SimTime.FromSecondsSinceEpoch(seconds);

    public EvaluatorHarness Number(string point, double seconds, double valueSi)
    {
        Evaluator.Submit(new TelemetrySample(point, At(seconds), new NumericValue(valueSi)));
        return this;
    }

    public EvaluatorHarness State(string point, double seconds, string state)
    {
        Evaluator.Submit(new TelemetrySample(point, At(seconds), new DiscreteValue(state)));
        return this;
    }

    /// <summary>A frame: numeric readings of several points at one instant, taken whole.</summary>
    public EvaluatorHarness Frame(double seconds, params (string Point, double ValueSi)[] readings)
    {
        Evaluator.Submit([.. readings.Select(r => new TelemetrySample(r.Point, At(seconds), new NumericValue(r.ValueSi)))]);
        return this;
    }

    public EvaluatorHarness Until(double seconds)
    {
        Assert.True(Evaluator.AdvanceTo(At(seconds)));
        return this;
    }
}
