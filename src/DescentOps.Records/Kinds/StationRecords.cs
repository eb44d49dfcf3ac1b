namespace DescentOps.Records.Kinds;

/// <summary>Record kinds of the journal written by one source. The surface station.</summary>
public static class StationRecords
{
    public const string CommandQueued = "station.command_queued";
    public const string CommandReleased = "station.command_released";
    public const string DataLost = "station.data_lost";
    public const string DwellEnded = "station.dwell_ended";
    public const string DwellStarted = "station.dwell_started";
    public const string Failed = "station.failed";
    public const string FrameLost = "station.frame_lost";
    public const string Link = "station.link";
    public const string LinkResumed = "station.link_resumed";
    public const string LinkWaiting = "station.link_waiting";
    public const string Radiation = "station.radiation";
    public const string Recovered = "station.recovered";
    public const string Started = "station.started";
    public const string Upset = "station.upset";
    public const string UpsetRecovered = "station.upset_recovered";
}
