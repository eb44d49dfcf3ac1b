using DescentOps.Records;
using DescentOps.Engine.Scheduling;

namespace DescentOps.Engine.Running;

/// <summary>What handling one event produced, kept apart until the kernel commits the instant.</summary>
internal sealed record EventResult(
    EventKey Trigger,
    SimEvent[] Scheduled,
    EventHandle[] Cancelled,
    JournalRecord[] Records,
    RunOutcome? StopRequest,
    ComponentFailure? Failure);

/// <summary>A handler that threw: what it threw and what the component's policy decided.</summary>
internal sealed record ComponentFailure(string ExceptionType, string Message, bool Restarted, int FailureCount);
