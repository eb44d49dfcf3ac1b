using DescentOps.Engine.Components;
using DescentOps.Records;
using DescentOps.Primitives.Time;

namespace DescentOps.Engine.Running;

/// <summary>Everything a kernel needs to run: the components, the seed, the time limit, where the events go and any outside inputs.</summary>
public sealed record KernelSetup(
    IReadOnlyList<ISimComponent> Components,
    long Seed,
    SimTime Until,
    IJournalSink Journal,
    Action<KernelProgress>? Progress = null,
    long ProgressEveryRounds = 4096)
{
    /// <summary>Inputs from outside known before the run starts (a replayed rehearsal's), in the order they were given.</summary>
    public IReadOnlyList<ExternalInput> Inputs { get; init; } = [];
}
