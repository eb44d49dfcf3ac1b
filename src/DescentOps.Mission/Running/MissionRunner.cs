using Akka.Actor;
using Akka.Configuration;
using DescentOps.Records;
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
        Action<KernelProgress>? progress = null,
        RunAdditions? additions = null)
    {
        var prepared = PreparedRun.For(scenario, seed);
        var summary = prepared.SummarySink(journal);
        var setup = new KernelSetup([.. MissionAssembly.Components(prepared.Scenario, prepared.Rules), .. additions?.Components ?? []], seed, SimTime.FromSecondsSinceEpoch(untilS), summary, progress)
        {
            Inputs = additions?.Inputs ?? [],
        };
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

        return prepared.Complete(summary.Summarize(result));
    }
}
