using DescentOps.Primitives.Time;

namespace DescentOps.Engine.Running;

/// <summary>
/// The sequential kernel taken one stretch of simulated time at a time, for a run that people watch and steer:
/// the caller decides how far to go (a paced clock) and may add outside inputs between stretches. It commits
/// through the same <see cref="KernelCore"/> as the other kernels, so given the same inputs up front they write
/// the same journal.
/// </summary>
public sealed class SteppedKernel
{
    private readonly KernelCore _core;
    private readonly Dictionary<Primitives.Identity.ComponentId, ComponentHost> _hosts;
    private readonly List<EventResult[]> _results = [];

    public SteppedKernel(KernelSetup setup)
    {
        _core = new KernelCore(setup);
        _hosts = setup.Components.ToDictionary(c => c.Id, c => new ComponentHost(c, setup.Seed));
    }

    /// <summary>
    /// Told of every event delivered, after its round is committed (a view of what reached a component; never part of
    /// the run, so it cannot change the journal).
    /// </summary>
    public Action<SimTime, Primitives.Identity.ComponentId, object>? Delivered { get; set; }

    /// <summary>The instant of the last round handled.</summary>
    public SimTime Now => _core.Now;

    public RunOutcome? Outcome => _core.Outcome;

    /// <summary>
    /// Handles every round up to and including <paramref name="limit"/>, at most <paramref name="maxRounds"/> of them
    /// (so a caller stays responsive); true when the run is still going.
    /// </summary>
    public bool RunUntil(SimTime limit, int maxRounds = int.MaxValue)
    {
        for (var done = 0; done < maxRounds && _core.Outcome is null; done++)
        {
            if (_core.TryPeekNextTime(out var next) && next > limit) break;
            if (!_core.TryBeginRound(out var batches)) break;
            _results.Clear();
            foreach (var (target, events) in batches) _results.Add(_hosts[target].HandleBatch(_core.Now, events));
            _core.CommitRound(_results);
            if (Delivered is { } tap)
            {
                foreach (var (target, events) in batches)
                {
                    foreach (var delivered in events) tap(_core.Now, target, delivered.Payload);
                }
            }
        }

        return _core.Outcome is null;
    }

    /// <summary>True when the next round falls at or before <paramref name="limit"/>.</summary>
    public bool HasRoundBy(SimTime limit) => _core.Outcome is null && (!_core.TryPeekNextTime(out var next) || next <= limit);

    /// <summary>Adds an outside input; it must fall after <see cref="Now"/> once a round has been handled.</summary>
    public void Inject(ExternalInput input) => _core.Inject(input);

    /// <summary>Ends the run from outside the event flow.</summary>
    public void Abort(RunOutcomeKind kind, string reason) => _core.Abort(kind, reason);

    public RunResult Result() => _core.Result();
}
