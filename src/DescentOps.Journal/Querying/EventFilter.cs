using DescentOps.Records;

namespace DescentOps.Journal.Querying;

/// <summary>
/// Which events to keep. Kinds and sources match exactly, or by prefix when the pattern ends in '.' or '*'
/// ("tether." keeps every tether event). Times are simulated seconds, inclusive. <see cref="Field"/> keeps
/// events that carry that data field (a telemetry point such as depth_m). <see cref="Landers"/> keeps the events of
/// those landers of a run with landers (their records carry the field <c>lander</c>).
/// </summary>
public sealed record EventFilter(
    IReadOnlyList<string> Kinds,
    IReadOnlyList<string> Sources,
    Severity MinimumSeverity = Severity.Debug,
    double FromS = double.NegativeInfinity,
    double ToS = double.PositiveInfinity,
    string? Field = null)
{
    public static EventFilter All { get; } = new([], []);

    /// <summary>Landers whose events to keep (all events when empty).</summary>
    public IReadOnlyList<string> Landers { get; init; } = [];

    /// <summary>The lander an event belongs to: its <c>lander</c> field, or null for a run without landers or a shared component's event.</summary>
    public static string? LanderOf(EventEntry entry)
    {
        ArgumentNullException.ThrowIfNull(entry);
        foreach (var field in entry.Data)
        {
            if (field.Name == "lander" && field.Kind == RecordFieldKind.Text) return field.Text;
        }

        return null;
    }

    public bool Matches(EventEntry entry) =>
        entry.Severity >= MinimumSeverity
        && entry.TimeSeconds >= FromS
        && entry.TimeSeconds <= ToS
        && MatchesAny(Kinds, entry.Kind)
        && MatchesAny(Sources, entry.Source)
        && (Field is null || entry.Data.Any(f => f.Name == Field))
        && (Landers.Count == 0 || (LanderOf(entry) is { } lander && Landers.Contains(lander)));

    /// <summary>Whether a kind passes the kind patterns (all kinds do when there are none).</summary>
    public bool MatchesKind(string kind) => MatchesAny(Kinds, kind);

    /// <summary>Whether a source passes the source patterns (all sources do when there are none).</summary>
    public bool MatchesSource(string source) => MatchesAny(Sources, source);

    private static bool MatchesAny(IReadOnlyList<string> patterns, string value)
    {
        if (patterns.Count == 0) return true;
        foreach (var pattern in patterns)
        {
            if (pattern.EndsWith('*') ? value.StartsWith(pattern[..^1], StringComparison.Ordinal)
                : pattern.EndsWith('.') ? value.StartsWith(pattern, StringComparison.Ordinal)
                : value == pattern)
            {
                return true;
            }
        }

        return false;
    }
}
