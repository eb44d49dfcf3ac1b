using DescentOps.Records;

namespace DescentOps.Engine.Tests.Support;

/// <summary>A journal whose disk is full: every write throws, as the sink contract says it must.</summary>
public sealed class FailingJournalSink : IJournalSink
{
    public void Write(JournalRecord record) => throw new IOException("journal device full");
}
