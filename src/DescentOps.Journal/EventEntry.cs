using DescentOps.Records;
using DescentOps.Primitives.Identity;
using DescentOps.Primitives.Time;

namespace DescentOps.Journal;

/// <summary>One event line of a journal.</summary>
/// <param name="LineNumber">1-based line in the file.</param>
/// <param name="Sequence">The event's number, from 1, independent of line numbers.</param>
/// <param name="TimeSeconds">Simulated seconds since the epoch, exactly as written.</param>
/// <param name="Source">The component that raised the event.</param>
/// <param name="Kind">What happened, as a dotted name ("probe.depth").</param>
/// <param name="Severity">How much it matters to an operator.</param>
/// <param name="Data">The event's values, in the order they were written.</param>
public sealed record EventEntry(
    long LineNumber,
    long Sequence,
    double TimeSeconds,
    string Source,
    string Kind,
    Severity Severity,
    IReadOnlyList<RecordField> Data) : JournalEntry(LineNumber)
{
    /// <summary>
    /// The engine record this line was written from. Exact: the writer prints ticks / 10^6 as a shortest
    /// round-trip double, and rounding that back times 10^6 recovers the tick count for any run shorter than
    /// 2^53 microseconds (about 285 years), past which doubles stop resolving single ticks.
    /// </summary>
    public JournalRecord ToRecord() => new(
        new SimTime(checked((long)Math.Round(TimeSeconds * SimDuration.TicksPerSecond))),
        new ComponentId(Source),
        Kind,
        Severity,
        Data);
}
