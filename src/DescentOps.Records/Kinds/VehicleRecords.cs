namespace DescentOps.Records.Kinds;

/// <summary>Record kinds of the journal written by one source. The vehicles released into the ocean.</summary>
public static class VehicleRecords
{
    public const string AcousticLink = "vehicle.acoustic_link";
    public const string BackInRange = "vehicle.back_in_range";
    public const string BatteryFailed = "vehicle.battery_failed";
    public const string Charging = "vehicle.charging";
    public const string CommandHeld = "vehicle.command_held";
    public const string Cycle = "vehicle.cycle";
    public const string DataLost = "vehicle.data_lost";
    public const string DockPower = "vehicle.dock_power";
    public const string Docked = "vehicle.docked";
    public const string Energy = "vehicle.energy";
    public const string Entrapped = "vehicle.entrapped";
    public const string FaultIgnored = "vehicle.fault_ignored";
    public const string Freed = "vehicle.freed";
    public const string LinkFault = "vehicle.link_fault";
    public const string LinkRestored = "vehicle.link_restored";
    public const string Lost = "vehicle.lost";
    public const string OutOfRange = "vehicle.out_of_range";
    public const string Performance = "vehicle.performance";
    public const string Profile = "vehicle.profile";
    public const string Recalled = "vehicle.recalled";
    public const string Released = "vehicle.released";
    public const string Returning = "vehicle.returning";
    public const string Sortie = "vehicle.sortie";
    public const string TaskComplete = "vehicle.task_complete";
}
