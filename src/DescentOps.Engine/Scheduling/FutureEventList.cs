using DescentOps.Primitives.Time;

namespace DescentOps.Engine.Scheduling;

/// <summary>
/// The pending events of a run in their total order. Cancellation is lazy: a cancelled event stays in the
/// heap and is dropped when it reaches the top, so cancelling costs O(1) and never reorders the heap.
/// </summary>
public sealed class FutureEventList
{
    private readonly PriorityQueue<SimEvent, EventKey> _heap = new();
    private readonly HashSet<EventHandle> _pending = [];
    private readonly HashSet<EventHandle> _cancelled = [];

    /// <summary>Events scheduled and neither delivered nor cancelled.</summary>
    public int Count => _pending.Count;

    public void Add(SimEvent simEvent)
    {
        if (!_pending.Add(simEvent.Key.Handle))
        {
            throw new InvalidOperationException($"Event {simEvent.Key} was scheduled twice: sender sequence numbers must be unique.");
        }

        _heap.Enqueue(simEvent, simEvent.Key);
    }

    /// <summary>Cancels a pending event; false when it was already delivered, cancelled, or never scheduled.</summary>
    public bool Cancel(EventHandle handle)
    {
        if (!_pending.Remove(handle)) return false;
        _cancelled.Add(handle);
        return true;
    }

    /// <summary>The time of the earliest live event, if any.</summary>
    public bool TryPeekTime(out SimTime time)
    {
        DropCancelledHead();
        if (_heap.TryPeek(out var head, out _))
        {
            time = head.Key.Time;
            return true;
        }

        time = default;
        return false;
    }

    /// <summary>
    /// Removes every live event at the earliest instant into <paramref name="round"/>, in key order.
    /// Events scheduled while this round is handled, even with zero delay, belong to a later round.
    /// </summary>
    public bool TryTakeRound(List<SimEvent> round, out SimTime time)
    {
        round.Clear();
        if (!TryPeekTime(out time)) return false;

        while (_heap.TryPeek(out var head, out _) && head.Key.Time == time)
        {
            _heap.Dequeue();
            var handle = head.Key.Handle;
            if (_cancelled.Remove(handle)) continue;
            _pending.Remove(handle);
            round.Add(head);
        }

        return true;
    }

    private void DropCancelledHead()
    {
        while (_heap.TryPeek(out var head, out _) && _cancelled.Contains(head.Key.Handle))
        {
            _heap.Dequeue();
            _cancelled.Remove(head.Key.Handle);
        }
    }
}
