using DescentOps.Records;
using DescentOps.Rules.Compiled;
using DescentOps.Scenarios.Model;

namespace DescentOps.Mission.Running;

/// <summary>
/// A scenario made ready for one seed, the same way for every kind of run (run, replay, branch, campaign, rehearsal):
/// its uncertain inputs drawn, its rules compiled, and the summary sink that knows which rule reads what (so a fault's
/// detection is judged the same everywhere) and that judges the scenario's criteria at the end.
/// </summary>
public sealed class PreparedRun
{
    private PreparedRun(Scenario scenario, CompiledRuleSet rules, IReadOnlyList<DrawnInput> inputs)
    {
        Scenario = scenario;
        Rules = rules;
        Inputs = inputs;
        RuleNames = scenario.Landers.Count == 0 ? [.. rules.Rules.Select(r => r.Name)] : CoveredRules(scenario);
    }

    /// <summary>The scenario with this seed's drawn values written in.</summary>
    public Scenario Scenario { get; }

    public CompiledRuleSet Rules { get; }

    public IReadOnlyList<DrawnInput> Inputs { get; }

    /// <summary>Every rule of the run, each name once (<see cref="CoveredRules"/>): the sink's coverage and the summary's rule names both.</summary>
    public IReadOnlyList<string> RuleNames { get; }

    public static PreparedRun For(Scenario scenario, long seed)
    {
        var (drawn, inputs) = UncertainDraw.Draw(scenario, seed);
        return new PreparedRun(drawn, Autonomy.MissionRules.Compile(drawn), inputs);
    }

    /// <summary>The summary sink in front of <paramref name="journal"/>; the drawn inputs are its first record.</summary>
    public MissionSummarySink SummarySink(IJournalSink journal)
    {
        var rulePoints = Rules.Rules.ToDictionary(r => r.Name, r => (IReadOnlyList<string>)[.. r.Condition.Points], StringComparer.Ordinal);
        var detectedBy = Scenario.Faults.Where(f => f.DetectedBy.Count > 0).GroupBy(f => f.Name).ToDictionary(g => g.Key, g => g.First().DetectedBy, StringComparer.Ordinal);
        var summary = new MissionSummarySink(Scenario.Landers.Count > 0 ? new LanderTagSink(journal) : journal, new FaultMeasures(rulePoints, detectedBy), [.. Scenario.Landers.Select(l => l.Name)])
        {
            CoveredRules = RuleNames,
            CoveredProcedures = CoveredProcedures(Scenario),
        };
        if (Inputs.Count > 0) summary.Write(UncertainDraw.Record(Inputs));
        return summary;
    }

    /// <summary>The rules of the scenario, or of every lander and then the mission's own (each name once, in the landers' order).</summary>
    public static IReadOnlyList<string> CoveredRules(Scenario scenario) =>
        scenario.Landers.Count == 0
            ? [.. Autonomy.MissionRules.Compile(scenario).Rules.Select(r => r.Name)]
            : [.. scenario.Landers.SelectMany(l => Autonomy.MissionRules.Compile(l.View).Rules.Select(r => r.Name))
                .Concat(Autonomy.MissionDeskRules.Compile(scenario).Rules.Select(r => r.Name)).Distinct()];

    /// <summary>The procedures of the scenario, or of every lander (each name once, the first lander's first).</summary>
    public static IReadOnlyList<Procedures.CompiledProcedure> CoveredProcedures(Scenario scenario)
    {
        if (scenario.Landers.Count == 0) return Procedures.MissionProcedures.Compile(scenario);
        var seen = new HashSet<string>(StringComparer.Ordinal);
        return [.. scenario.Landers.SelectMany(l => Procedures.MissionProcedures.Compile(l.View)).Where(p => seen.Add(p.Name))];
    }

    /// <summary>The summary with what the sink cannot know: the drawn inputs, the rule set, and the criteria judged.</summary>
    public MissionSummary Complete(MissionSummary summary)
    {
        var figures = summary with
        {
            Inputs = Inputs,
            RuleNames = RuleNames,
            Landers = [.. summary.Landers.Select(l => l with { FaultsUnrecovered = Unrecovered(summary, l.Lander) })],
        };
        var completed = summary.Outcome.Kind == Engine.Running.RunOutcomeKind.Completed;
        return figures with
        {
            Criteria = CriterionResult.Judge(Scenario.Criteria, figures),
            Landers = [.. figures.Landers.Select(l =>
            {
                var criteria = CriterionResult.JudgeLander(Scenario.Criteria, l);
                return l with { Criteria = criteria, Success = completed && criteria.All(c => c.Passed) };
            })],
        };
    }

    /// <summary>Faults of a lander with a recovery measure that did not recover (as the run's <c>faults_unrecovered</c>).</summary>
    private int Unrecovered(MissionSummary summary, string lander)
    {
        var own = Scenario.Landers.First(l => l.Name == lander).View.Faults.Select(f => f.Name).ToHashSet(StringComparer.Ordinal);
        return summary.Faults.Count(f => own.Contains(f.Fault) && f.Unrecovered);
    }
}
