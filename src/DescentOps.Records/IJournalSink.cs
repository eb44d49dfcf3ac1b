namespace DescentOps.Records;

/// <summary>
/// Where the kernel sends the run's events, already in their final deterministic order. The kernel calls it
/// from one thread at a time. Implementations must let failures propagate: a journal that cannot be
/// written must stop the run rather than lose events silently.
/// </summary>
public interface IJournalSink
{
    void Write(JournalRecord record);
}
