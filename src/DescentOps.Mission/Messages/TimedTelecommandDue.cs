namespace DescentOps.Mission.Messages;

/// <summary>A time-tagged telecommand's time has come (its index in the mission's list of them).</summary>
public sealed record TimedTelecommandDue(int Index);
