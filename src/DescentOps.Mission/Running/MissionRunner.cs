using Akka.Actor;
using Akka.Configuration;
using DescentOps.Engine.Journaling;
using DescentOps.Engine.Running;
using DescentOps.Primitives.Time;
using DescentOps.Scenarios.Model;

namespace DescentOps.Mission.Running;

/// <summary>Runs one mission from a scenario to its end and returns its summary; the journal gets every event.</summary>
public static class MissionRunner
{
    /// <summary>Akka's own diagnostics stay quiet; the mission log is the journal, not Akka's logger.</summary>
    private static readonly Config ActorSystemConfig = ConfigurationFactory.ParseString("""
        akka.loglevel = WARNING
        akka.stdout-loglevel = WARNING
        akka.log-dead-letters = off
        akka.log-dead-letters-during-shutdown = off
        """);

    public static async Task<MissionSummary> RunAsync(
        Scenario scenario,
        long seed,
        double untilS,
        IJournalSink journal,
        KernelChoice kernel = KernelChoice.Actors,
        Action<KernelProgress>? progress = null)
    {
        var (drawn, inputs) = UncertainDraw.Draw(scenario, seed);
        scenario = drawn;
        var rules = Autonomy.MissionRules.Compile(scenario);
        var rulePoints = rules.Rules.ToDictionary(r => r.Name, r => (IReadOnlyList<string>)[.. r.Condition.Points], StringComparer.Ordinal);
        var detectedBy = scenario.Faults.Where(f => f.DetectedBy.Count > 0).GroupBy(f => f.Name).ToDictionary(g => g.Key, g => g.First().DetectedBy, StringComparer.Ordinal);
        var summary = new MissionSummarySink(journal, new FaultMeasures(rulePoints, detectedBy), new RunFigures(scenario.Probe.TelemetryIntervalS));
        if (inputs.Count > 0) summary.Write(UncertainDraw.Record(inputs));
        var setup = new KernelSetup(MissionAssembly.Components(scenario, rules), seed, SimTime.FromSecondsSinceEpoch(untilS), summary, progress);
        RunResult result;
        if (kernel == KernelChoice.Sequential)
        {
            result = SequentialKernel.Run(setup);
        }
        else
        {
            using var system = ActorSystem.Create("descentops", ActorSystemConfig);
            try
            {
                result = await ActorKernel.RunAsync(system, setup).ConfigureAwait(false);
            }
            finally
            {
                await system.Terminate().ConfigureAwait(false);
            }
        }

        var figures = summary.Summarize(result) with { Inputs = inputs, RuleNames = [.. rules.Rules.Select(r => r.Name)] };
        return figures with { Criteria = CriterionResult.Judge(scenario.Criteria, figures) };
    }
}
