namespace DescentOps.Journal.Comparison;

/// <summary>
/// The first line where two journals part: its 1-based number, the simulated time on each side (when the
/// line has one) and both lines, either of which is null when that journal ended first.
/// </summary>
public sealed record JournalDivergence(long Line, double? TimeA, double? TimeB, string? LineA, string? LineB);
