using DescentOps.Primitives.Identity;
using DescentOps.Primitives.Time;

namespace DescentOps.Engine.Scheduling;

/// <summary>
/// The total order of events: (time, priority class, sender id, sender's own sequence number). Two distinct
/// events never compare equal, because a sender numbers everything it schedules.
/// </summary>
public readonly record struct EventKey(SimTime Time, EventPriority Priority, ComponentId Sender, long SenderSequence)
    : IComparable<EventKey>
{
    public int CompareTo(EventKey other)
    {
        var c = Time.CompareTo(other.Time);
        if (c != 0) return c;
        c = Priority.CompareTo(other.Priority);
        if (c != 0) return c;
        c = Sender.CompareTo(other.Sender);
        return c != 0 ? c : SenderSequence.CompareTo(other.SenderSequence);
    }

    public EventHandle Handle => new(Sender, SenderSequence);

    public static bool operator <(EventKey left, EventKey right) => left.CompareTo(right) < 0;
    public static bool operator <=(EventKey left, EventKey right) => left.CompareTo(right) <= 0;
    public static bool operator >(EventKey left, EventKey right) => left.CompareTo(right) > 0;
    public static bool operator >=(EventKey left, EventKey right) => left.CompareTo(right) >= 0;
}
