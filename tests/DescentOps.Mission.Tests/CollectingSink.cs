using DescentOps.Engine.Journaling;

namespace DescentOps.Mission.Tests;

/// <summary>Keeps every journal record in memory, for assertions on what a run did.</summary>
internal sealed class CollectingSink : IJournalSink
{
    public List<JournalRecord> Records { get; } = [];

    public void Write(JournalRecord record) => Records.Add(record);

    public IEnumerable<JournalRecord> OfKind(string kind) => Records.Where(r => r.Kind == kind);

    public static double Field(JournalRecord record, string name) => record.Fields.Single(f => f.Name == name).Number;

    public static long IntegerField(JournalRecord record, string name) => record.Fields.Single(f => f.Name == name).Integer;
}
