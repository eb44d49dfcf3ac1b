using DescentOps.Records;

namespace DescentOps.Cli.Running;

/// <summary>Hands each record to the journal, then to an observer (progress) that must not throw.</summary>
public sealed class TeeSink(IJournalSink journal, IJournalSink observer) : IJournalSink
{
    public void Write(JournalRecord record)
    {
        journal.Write(record);
        observer.Write(record);
    }
}
