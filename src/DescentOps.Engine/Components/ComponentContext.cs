using DescentOps.Records;
using DescentOps.Engine.Randomness;
using DescentOps.Engine.Running;
using DescentOps.Engine.Scheduling;
using DescentOps.Primitives.Identity;
using DescentOps.Primitives.Time;

namespace DescentOps.Engine.Components;

/// <summary>
/// What a component may do while it handles one event. Nothing takes effect at once: the kernel collects
/// the outputs and commits them in the total event order after every handler of the instant has finished,
/// and throws them away if this handler fails.
/// </summary>
public sealed class ComponentContext
{
    private readonly List<SimEvent> _scheduled = [];
    private readonly List<EventHandle> _cancelled = [];
    private readonly List<JournalRecord> _records = [];
    private long _nextSequence;

    internal ComponentContext(ComponentId self, RandomStream random)
    {
        Self = self;
        Random = random;
    }

    public ComponentId Self { get; }

    public SimTime Now { get; private set; }

    /// <summary>The component's own stream; draws survive a rolled-back handling, which keeps runs repeatable.</summary>
    public RandomStream Random { get; }

    /// <summary>
    /// A context outside any kernel, at <paramref name="now"/>: a handler can be called per message and its outputs
    /// read back (what it scheduled, cancelled, recorded, and whether it asked to stop the run). For tests and tools.
    /// </summary>
    public static ComponentContext Detached(ComponentId self, RandomStream random, SimTime now)
    {
        var context = new ComponentContext(self, random);
        context.Begin(now);
        return context;
    }

    /// <summary>Events scheduled during the current handling, in the order they were scheduled.</summary>
    public IReadOnlyList<SimEvent> Scheduled => _scheduled;

    /// <summary>Events cancelled during the current handling.</summary>
    public IReadOnlyList<EventHandle> Cancelled => _cancelled;

    /// <summary>Records written during the current handling.</summary>
    public IReadOnlyList<JournalRecord> Records => _records;

    /// <summary>The run's end this handling asked for, if any.</summary>
    public RunOutcome? StopRequest { get; private set; }

    /// <summary>Schedules <paramref name="payload"/> for <paramref name="target"/> after <paramref name="delay"/> (zero allowed).</summary>
    public EventHandle Schedule(ComponentId target, SimDuration delay, object payload, EventPriority? priority = null)
    {
        if (delay < SimDuration.Zero)
        {
            throw new ArgumentOutOfRangeException(nameof(delay), delay, $"{Self} tried to schedule into the past.");
        }

        var key = new EventKey(Now + delay, priority ?? EventPriority.Normal, Self, _nextSequence++);
        _scheduled.Add(new SimEvent(key, target, payload));
        return key.Handle;
    }

    /// <summary>Schedules a message to this component itself: a timer.</summary>
    public EventHandle ScheduleSelf(SimDuration delay, object payload, EventPriority? priority = null) =>
        Schedule(Self, delay, payload, priority);

    /// <summary>Cancels an event this component scheduled earlier; cancelling one already delivered does nothing.</summary>
    public void Cancel(EventHandle handle)
    {
        if (handle.Sender != Self)
        {
            throw new InvalidOperationException($"{Self} may cancel only its own events, not one of {handle.Sender}.");
        }

        _cancelled.Add(handle);
    }

    public void Record(string kind, Severity severity, params RecordField[] fields) =>
        _records.Add(new JournalRecord(Now, Self, kind, severity, fields));

    /// <summary>Ends the run once this instant is committed.</summary>
    public void StopRun(RunOutcomeKind kind, string reason) => StopRequest = new RunOutcome(kind, reason, Now);

    internal void Begin(SimTime now)
    {
        Now = now;
        _scheduled.Clear();
        _cancelled.Clear();
        _records.Clear();
        StopRequest = null;
    }

    internal long SequenceMark => _nextSequence;

    internal void RollBackSequence(long mark) => _nextSequence = mark;
}
