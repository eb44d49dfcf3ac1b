namespace DescentOps.Benchmarks.Phold;

/// <summary>The repeated measurements of one engine case, and the run they all had to agree on.</summary>
public sealed class CaseTiming(EngineCase engine)
{
    private readonly List<double> _seconds = [];
    private readonly List<double> _cpuSeconds = [];
    private long _allocatedBytes;

    public EngineCase Engine { get; } = engine;

    public PholdRun? Run { get; private set; }

    public double MedianSeconds => Median(_seconds);

    public double EventsPerSecond => Run!.Value.TokenEvents / MedianSeconds;

    /// <summary>
    /// Per second of CPU time over all the process's threads: steadier than wall time on a shared machine,
    /// where a two-thread engine can simply get a bigger share of the cores than a one-thread one.
    /// </summary>
    public double EventsPerCpuSecond => Run!.Value.TokenEvents / Median(_cpuSeconds);

    /// <summary>Bytes allocated on all threads per token event, averaged over the repeats.</summary>
    public double AllocatedBytesPerEvent => _allocatedBytes / (double)(_seconds.Count * Run!.Value.TokenEvents);

    public void Add(PholdRun run, double seconds, double cpuSeconds, long allocatedBytes)
    {
        // Every repeat of a deterministic run must be the same run; a difference is a kernel bug, not noise.
        if (Run is { } first && first != run)
        {
            throw new InvalidOperationException($"{Engine.Label} gave {run} after {first}");
        }

        Run = run;
        _seconds.Add(seconds);
        _cpuSeconds.Add(cpuSeconds);
        _allocatedBytes += allocatedBytes;
    }

    private static double Median(List<double> values)
    {
        var sorted = values.Order().ToArray();
        return sorted.Length % 2 == 1 ? sorted[sorted.Length / 2] : (sorted[(sorted.Length / 2) - 1] + sorted[sorted.Length / 2]) / 2;
    }
}
