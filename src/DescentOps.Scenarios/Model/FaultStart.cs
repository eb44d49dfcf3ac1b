using DescentOps.Scenarios.Loading;

namespace DescentOps.Scenarios.Model;

/// <summary>
/// When a fault starts: exactly one of a closed set of triggers (the constructor is private, so no other kind exists).
/// </summary>
public abstract record FaultStart
{
    private FaultStart()
    {
    }

    /// <summary>At a simulated time, in seconds since the run's start.</summary>
    public sealed record AtTime(double AtS) : FaultStart;

    /// <summary>When the probe's head reaches a depth.</summary>
    public sealed record AtDepth(double DepthM) : FaultStart;

    /// <summary>When a condition (rule-language text, located at <paramref name="WhenAt"/>) first holds on the probe's true state.</summary>
    public sealed record OnCondition(string When, SourceLocation WhenAt) : FaultStart;

    /// <summary>At random: a Poisson process with mean interval <paramref name="MeanIntervalS"/> after <paramref name="NotBeforeS"/>, up to <paramref name="Occurrences"/> times.</summary>
    public sealed record AtRandom(double MeanIntervalS, double NotBeforeS, int Occurrences) : FaultStart;
}
