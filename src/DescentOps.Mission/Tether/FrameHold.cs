using System.Collections.Immutable;

namespace DescentOps.Mission.Tether;

/// <summary>
/// A first-in, first-out buffer of whole items (frames or commands) with a fixed capacity. A full hold refuses what is
/// offered instead of pushing out what it holds, so the caller always knows which item was not kept.
/// </summary>
public sealed record FrameHold<T>(ImmutableQueue<T> Items, int Count, int Capacity)
{
    /// <summary>An empty hold of <paramref name="capacity"/> items.</summary>
    public FrameHold(int capacity)
        : this(ImmutableQueue<T>.Empty, 0, capacity)
    {
    }

    public bool IsFull => Count >= Capacity;

    public int Room => Math.Max(0, Capacity - Count);

    /// <summary>Share of the capacity in use; a hold of no capacity is never anything but empty.</summary>
    public double Fill => Capacity == 0 ? 0.0 : (double)Count / Capacity;

    /// <summary>The hold with <paramref name="item"/> at its tail, or null when it is full.</summary>
    public FrameHold<T>? Offer(T item) => IsFull ? null : this with { Items = Items.Enqueue(item), Count = Count + 1 };

    public FrameHold<T> Cleared() => new(Capacity);
}
