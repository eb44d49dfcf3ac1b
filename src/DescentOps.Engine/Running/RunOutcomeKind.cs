namespace DescentOps.Engine.Running;

/// <summary>How a run ended. The names are written into the journal's summary line and must stay stable.</summary>
public enum RunOutcomeKind
{
    /// <summary>A component declared the mission's end condition met.</summary>
    Completed,

    /// <summary>A component declared the mission lost (probe frozen in for good, all links gone...).</summary>
    MissionLost,

    /// <summary>The run reached its time limit before any end condition.</summary>
    TimeLimit,

    /// <summary>No event was left to deliver.</summary>
    Quiescent,

    /// <summary>A component threw and its policy (or its restart budget) said abort.</summary>
    ComponentFailed,

    /// <summary>The kernel itself could not go on (an actor died outside a handler, the journal failed).</summary>
    KernelFault,
}
