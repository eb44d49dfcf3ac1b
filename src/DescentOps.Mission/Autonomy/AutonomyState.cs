using DescentOps.Engine.Scheduling;

namespace DescentOps.Mission.Autonomy;

/// <summary>The on-board autonomy's committed state: its pending wake-up and how many commands it issued.</summary>
public sealed record AutonomyState(EventHandle? PendingWake, long CommandsIssued, int RulesVersion = 0);
