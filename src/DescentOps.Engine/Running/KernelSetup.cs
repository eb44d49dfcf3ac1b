using DescentOps.Engine.Components;
using DescentOps.Records;
using DescentOps.Primitives.Time;

namespace DescentOps.Engine.Running;

/// <summary>Everything a kernel needs to run: the components, the seed, the time limit and where the events go.</summary>
public sealed record KernelSetup(
    IReadOnlyList<ISimComponent> Components,
    long Seed,
    SimTime Until,
    IJournalSink Journal,
    Action<KernelProgress>? Progress = null,
    long ProgressEveryRounds = 4096);
