namespace DescentOps.Engine.Scheduling;

/// <summary>
/// The second key of the total event order: among events at one instant, a lower value is delivered first.
/// The kernel knows no mission meaning; a domain names its own classes with these values.
/// </summary>
public readonly record struct EventPriority(byte Value) : IComparable<EventPriority>
{
    public static EventPriority First => new(0);
    public static EventPriority Normal => new(128);
    public static EventPriority Last => new(255);

    public int CompareTo(EventPriority other) => Value.CompareTo(other.Value);

    public static bool operator <(EventPriority left, EventPriority right) => left.CompareTo(right) < 0;
    public static bool operator <=(EventPriority left, EventPriority right) => left.CompareTo(right) <= 0;
    public static bool operator >(EventPriority left, EventPriority right) => left.CompareTo(right) > 0;
    public static bool operator >=(EventPriority left, EventPriority right) => left.CompareTo(right) >= 0;
}
