namespace DescentOps.Records.Kinds;

/// <summary>Record kinds of the journal written by one source. The link home shared by several landers.</summary>
public static class LinkRecords
{
    public const string CommandSent = "link.command_sent";
    public const string Sent = "link.sent";
    public const string Started = "link.started";
    public const string StationDown = "link.station_down";
    public const string StationUp = "link.station_up";
}
