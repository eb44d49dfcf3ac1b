using DescentOps.Engine.Components;
using DescentOps.Engine.Running;
using DescentOps.Primitives.Time;

namespace DescentOps.Engine.Tests.Support;

/// <summary>Runs one model through the kernel a theory names and hands back the result with its journal.</summary>
public static class KernelRunner
{
    /// <summary>Only a guard against a hang: a run that needs this long is broken, not slow.</summary>
    public static readonly TimeSpan HangGuard = TimeSpan.FromSeconds(30);

    public static async Task<(RunResult Result, IReadOnlyList<string> Journal)> RunAsync(
        KernelKind kind,
        ActorSystemFixture actors,
        IReadOnlyList<ISimComponent> components,
        SimTime until,
        long seed = 1)
    {
        var sink = new CollectingJournalSink();
        var setup = new KernelSetup(components, seed, until, sink);
        var result = kind switch
        {
            KernelKind.Sequential => SequentialKernel.Run(setup),
            KernelKind.Actor => await ActorKernel.RunAsync(actors.System, setup).WaitAsync(HangGuard),
            _ => throw new ArgumentOutOfRangeException(nameof(kind), kind, null),
        };
        return (result, sink.Lines);
    }
}
