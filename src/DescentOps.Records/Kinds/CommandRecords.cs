namespace DescentOps.Records.Kinds;

/// <summary>Record kinds of the journal written by one source. Telecommands carried out or lost on the way.</summary>
public static class CommandRecords
{
    public const string Executed = "command.executed";
    public const string Lost = "command.lost";
}
