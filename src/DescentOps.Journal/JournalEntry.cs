namespace DescentOps.Journal;

/// <summary>One line of a journal as read back: the manifest, an event or the summary.</summary>
/// <param name="LineNumber">1-based line in the file, for messages that point an operator at the line.</param>
public abstract record JournalEntry(long LineNumber);
