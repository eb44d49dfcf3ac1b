namespace DescentOps.Records.Kinds;

/// <summary>Record kinds of the journal written by one source. Data refused by a full buffer of the link.</summary>
public static class DataRecords
{
    public const string Lost = "data.lost";
}
