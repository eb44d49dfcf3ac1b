namespace DescentOps.Records.Kinds;

/// <summary>Record kinds of the journal written by one source. The descending probe.</summary>
public static class ProbeRecords
{
    public const string Breakthrough = "probe.breakthrough";
    public const string CannotMeltFree = "probe.cannot_melt_free";
    public const string DebrisBandCrossed = "probe.debris_band_crossed";
    public const string DescentStarted = "probe.descent_started";
    public const string DockPower = "probe.dock_power";
    public const string HeatPath = "probe.heat_path";
    public const string Jets = "probe.jets";
    public const string NozzleClogged = "probe.nozzle_clogged";
    public const string NozzleCleared = "probe.nozzle_cleared";
    public const string LoadRestored = "probe.load_restored";
    public const string LoadShed = "probe.load_shed";
    public const string MeltingFree = "probe.melting_free";
    public const string MissionComplete = "probe.mission_complete";
    public const string Power = "probe.power";
    public const string RefreezeStall = "probe.refreeze_stall";
    public const string Refreezing = "probe.refreezing";
    public const string Regime = "probe.regime";
    public const string SensorFault = "probe.sensor_fault";
    public const string SensorRestored = "probe.sensor_restored";
    public const string Started = "probe.started";
    public const string Telemetry = "probe.telemetry";
    public const string TiltLimit = "probe.tilt_limit";
    public const string WallDeficit = "probe.wall_deficit";
    public const string WallSufficient = "probe.wall_sufficient";
}
