namespace DescentOps.Records.Kinds;

/// <summary>Record kinds of the journal written by one source. The link home shared by several landers.</summary>
public static class LinkHomeRecords
{
    public const string CommandSent = "link_home.command_sent";
    public const string Sent = "link_home.sent";
    public const string Started = "link_home.started";
    public const string StationDown = "link_home.station_down";
    public const string StationUp = "link_home.station_up";
}
