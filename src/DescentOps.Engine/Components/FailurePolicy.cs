namespace DescentOps.Engine.Components;

/// <summary>What the kernel does when a component throws while handling an event.</summary>
public enum FailurePolicy
{
    /// <summary>
    /// Log the failure, drop the event and everything the failed handling produced, and carry on from the
    /// component's last committed state (a reboot of that unit, in operations terms).
    /// </summary>
    RestartFromLastState,

    /// <summary>Log the failure and end the run with the outcome <see cref="Running.RunOutcomeKind.ComponentFailed"/>.</summary>
    AbortRun,
}
