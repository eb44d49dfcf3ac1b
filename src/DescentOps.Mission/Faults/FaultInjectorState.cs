using DescentOps.Engine.Scheduling;

namespace DescentOps.Mission.Faults;

/// <summary>How many faults have started and ended so far, and the pending wake-up of the trigger conditions.</summary>
public sealed record FaultInjectorState(int Started, int Cleared, EventHandle? PendingWake = null);
