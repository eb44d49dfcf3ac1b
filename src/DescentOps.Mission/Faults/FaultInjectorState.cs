namespace DescentOps.Mission.Faults;

/// <summary>How many faults have started and ended so far.</summary>
public sealed record FaultInjectorState(int Started, int Cleared);
