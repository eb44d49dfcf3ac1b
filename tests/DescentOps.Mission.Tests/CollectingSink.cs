using DescentOps.Records;

namespace DescentOps.Mission.Tests;

/// <summary>Keeps every journal record in memory, for assertions on what a run did.</summary>
internal sealed class CollectingSink : IJournalSink
{
    public List<JournalRecord> Records { get; } = [];

    public void Write(JournalRecord record) => Records.Add(record);

    public IEnumerable<JournalRecord> OfKind(string kind) => Records.Where(r => r.Kind == kind);

    public static double Field(JournalRecord record, string name) => record.Fields.Single(f => f.Name == name).Number;

    public static long IntegerField(JournalRecord record, string name) => record.Fields.Single(f => f.Name == name).Integer;

    public static string TextField(JournalRecord record, string name) => record.Fields.Single(f => f.Name == name).Text ?? "";

    /// <summary>A text field holding numbers separated by spaces, as the injector logs the random faults' draws.</summary>
    public static IReadOnlyList<double> NumbersField(JournalRecord record, string name) =>
        [.. TextField(record, name).Split(' ').Select(s => double.Parse(s, System.Globalization.CultureInfo.InvariantCulture))];
}
