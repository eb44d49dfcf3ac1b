namespace DescentOps.Rehearsal.Web;

/// <summary>
/// Bounds on one server: request bodies, watchers at once, and (for tests and unattended use) a total number of
/// requests and a lifetime, after which the session ends itself and the server stops.
/// </summary>
public sealed record ServerLimits
{
    public int MaxBodyBytes { get; init; } = 16 * 1024;

    public int MaxStreams { get; init; } = 32;

    public long? MaxRequests { get; init; }

    public TimeSpan? MaxLifetime { get; init; }

    /// <summary>How often the simulation is moved on to where the clock says it is.</summary>
    public TimeSpan TickInterval { get; init; } = TimeSpan.FromMilliseconds(40);

    /// <summary>How often a watcher's stream is sent what is new.</summary>
    public TimeSpan StreamInterval { get; init; } = TimeSpan.FromMilliseconds(150);
}
