namespace DescentOps.Records.Kinds;

/// <summary>Record kinds of the journal written by one source. Telecommands carried out or lost on the way.</summary>
public static class CommandRecords
{
    public const string Executed = "command.executed";
    public const string Lost = "command.lost";

    /// <summary>A time-tagged telecommand the ground sends at its time.</summary>
    public const string Sent = "command.sent";

    /// <summary>A stored telecommand the probe's store releases at its time.</summary>
    public const string Released = "command.released";
}
