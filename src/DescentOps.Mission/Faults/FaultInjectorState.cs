using System.Collections.Immutable;
using DescentOps.Engine.Scheduling;
using DescentOps.Scenarios.Model;

namespace DescentOps.Mission.Faults;

/// <summary>
/// How many faults have started and ended so far, and the pending wake-up of the trigger conditions; with faults
/// given while the run goes, those faults, the faults active now and those ended by hand (whose own end is skipped).
/// </summary>
public sealed record FaultInjectorState(int Started, int Cleared, EventHandle? PendingWake = null)
{
    public ImmutableList<FaultModel> Added { get; init; } = [];

    public ImmutableHashSet<int> Active { get; init; } = [];

    public ImmutableHashSet<int> ClearedByHand { get; init; } = [];
}
