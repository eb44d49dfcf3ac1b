namespace DescentOps.Records.Kinds;

/// <summary>Record kinds of the journal written by one source. The ground team's view of the telemetry.</summary>
public static class GroundRecords
{
    public const string Gap = "ground.gap";
    public const string Telemetry = "ground.telemetry";

    /// <summary>What the ground knows of its station changed (only when a ground rule or procedure reads it).</summary>
    public const string StationStatus = "ground.station_status";
}
