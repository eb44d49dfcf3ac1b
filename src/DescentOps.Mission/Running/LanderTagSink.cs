using DescentOps.Records;

namespace DescentOps.Mission.Running;

/// <summary>
/// In front of the journal of a run with landers: every record a lander's component writes gets the lander's name as
/// its first field (<c>lander</c>), so a query, an export or a report need not parse component ids. Runs without landers
/// do not get this sink, so their records keep their shape.
/// </summary>
public sealed class LanderTagSink(IJournalSink next) : IJournalSink
{
    public const string Field = "lander";

    public void Write(JournalRecord record)
    {
        ArgumentNullException.ThrowIfNull(record);
        next.Write(LanderIds.LanderOf(record.Source) is { } lander
            ? record with { Fields = [RecordField.Of(Field, lander), .. record.Fields] }
            : record);
    }
}
