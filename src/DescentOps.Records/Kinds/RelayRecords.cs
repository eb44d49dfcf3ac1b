namespace DescentOps.Records.Kinds;

/// <summary>Record kinds of the journal written by one source. The radio relays on the tether.</summary>
public static class RelayRecords
{
    public const string BatteryFlat = "relay.battery_flat";
    public const string Dropped = "relay.dropped";
    public const string Failed = "relay.failed";
    public const string NoneLeft = "relay.none_left";
    public const string PathDown = "relay.path_down";
    public const string PathUp = "relay.path_up";
    public const string Recovered = "relay.recovered";
}
