using DescentOps.Engine.Components;
using DescentOps.Engine.Running;
using DescentOps.Primitives.Identity;

namespace DescentOps.Benchmarks.Phold;

/// <summary>Builds the kernel model and turns a kernel's result into the benchmark's figures.</summary>
public static class PholdModel
{
    public static ComponentId[] ProcessIds(PholdOptions options) =>
        [.. Enumerable.Range(0, options.Processes).Select(i => new ComponentId($"lp-{i}"))];

    public static IReadOnlyList<ISimComponent> Components(PholdOptions options, DelayLaw law, bool journalEvents)
    {
        var ids = ProcessIds(options);
        return [.. ids.Select((_, i) => (ISimComponent)new PholdProcess(i, ids, options, law, journalEvents))];
    }

    /// <summary>Token events exclude each process's start and its report at the limit.</summary>
    public static PholdRun Summarise(PholdOptions options, RunResult result, ChecksumSink sink)
    {
        if (result.Outcome.Kind != RunOutcomeKind.TimeLimit)
        {
            throw new InvalidOperationException($"PHOLD ended as {result.Outcome.Kind}: {result.Outcome.Reason}");
        }

        return new PholdRun(result.EventsDelivered - (2L * options.Processes), sink.Checksum(ProcessIds(options).Select(id => id.Name)), result.Rounds);
    }
}
