namespace DescentOps.Mission.Messages;

/// <summary>The ground's time to uplink a rule set has come (its index in the mission's list of uplinks).</summary>
public sealed record RuleUplinkDue(int Index);
