namespace DescentOps.Records;

/// <summary>Discards records: for benchmarks that measure the kernel without a log.</summary>
public sealed class NullJournalSink : IJournalSink
{
    public static NullJournalSink Instance { get; } = new();

    private NullJournalSink()
    {
    }

    public void Write(JournalRecord record)
    {
    }
}
