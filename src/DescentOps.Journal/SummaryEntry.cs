namespace DescentOps.Journal;

/// <summary>The last line of a complete journal.</summary>
/// <param name="LineNumber">1-based line in the file.</param>
/// <param name="Summary">How the run ended.</param>
/// <param name="EventCount">How many events the writer says it wrote before the summary.</param>
public sealed record SummaryEntry(long LineNumber, RunSummary Summary, long EventCount) : JournalEntry(LineNumber);
