using DescentOps.Primitives.Identity;
using DescentOps.Primitives.Time;

namespace DescentOps.Records;

/// <summary>One event of the mission log: what happened, when, where, and the values that say how.</summary>
public sealed record JournalRecord(
    SimTime Time,
    ComponentId Source,
    string Kind,
    Severity Severity,
    IReadOnlyList<RecordField> Fields);
