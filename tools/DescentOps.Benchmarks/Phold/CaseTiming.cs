namespace DescentOps.Benchmarks.Phold;

/// <summary>The repeated measurements of one engine case, and the run they all had to agree on.</summary>
public sealed class CaseTiming(EngineCase engine)
{
    private readonly List<double> _seconds = [];

    public EngineCase Engine { get; } = engine;

    public PholdRun? Run { get; private set; }

    public double MedianSeconds
    {
        get
        {
            var sorted = _seconds.Order().ToArray();
            return sorted.Length % 2 == 1 ? sorted[sorted.Length / 2] : (sorted[(sorted.Length / 2) - 1] + sorted[sorted.Length / 2]) / 2;
        }
    }

    public double EventsPerSecond => Run!.Value.TokenEvents / MedianSeconds;

    public void Add(PholdRun run, double seconds)
    {
        // Every repeat of a deterministic run must be the same run; a difference is a kernel bug, not noise.
        if (Run is { } first && first != run)
        {
            throw new InvalidOperationException($"{Engine.Label} gave {run} after {first}");
        }

        Run = run;
        _seconds.Add(seconds);
    }
}
