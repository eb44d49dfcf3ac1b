namespace DescentOps.Journal;

/// <summary>The first line of a journal.</summary>
public sealed record ManifestEntry(long LineNumber, RunManifest Manifest) : JournalEntry(LineNumber);
