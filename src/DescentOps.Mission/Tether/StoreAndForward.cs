using System.Collections.Immutable;

namespace DescentOps.Mission.Tether;

/// <summary>
/// Moves held items up a chain of buffers in one instant. Node 0 is the probe end, the last node the relay nearest the
/// surface; hop i joins node i to node i + 1, and the last hop reaches the surface. Items cross every closed hop in
/// order and wait below an open one; a node takes only what it has room for (the sender keeps the rest), so nothing
/// is lost here: losses happen only where an item is offered to a full hold or a relay dies with items in it.
/// The work is proportional to what moves, not to what is held, so a long outage with full buffers stays cheap.
/// </summary>
public static class StoreAndForward
{
    /// <param name="holds">Buffers from the probe end upwards.</param>
    /// <param name="hopCloses">Whether hop i (node i to the node above it, or to the surface) closes now.</param>
    public static SettledChain<T> Settle<T>(IReadOnlyList<FrameHold<T>> holds, IReadOnlyList<bool> hopCloses)
    {
        ArgumentNullException.ThrowIfNull(holds);
        ArgumentNullException.ThrowIfNull(hopCloses);
        if (hopCloses.Count != holds.Count) throw new ArgumentException("One hop leaves every node.", nameof(hopCloses));

        var nodes = holds.ToArray();
        // Items that reach a node in this instant sit behind those it already held; their starting nodes are kept in
        // arrival order so that each delivered item can be charged the path it travelled.
        var arrivals = new Queue<int>?[nodes.Length];
        var delivered = new List<(T Item, int FromNode)>();
        for (var i = 0; i < nodes.Length; i++)
        {
            if (!hopCloses[i] || nodes[i].Count == 0) continue;
            var last = i == nodes.Length - 1;
            var moving = last ? nodes[i].Count : Math.Min(nodes[i].Count, nodes[i + 1].Room);
            var heldBefore = nodes[i].Count - (arrivals[i]?.Count ?? 0);
            var items = nodes[i].Items;
            for (var k = 0; k < moving; k++)
            {
                items = items.Dequeue(out var item);
                var from = k < heldBefore ? i : arrivals[i]!.Dequeue();
                if (last)
                {
                    delivered.Add((item, from));
                }
                else
                {
                    nodes[i + 1] = nodes[i + 1] with { Items = nodes[i + 1].Items.Enqueue(item), Count = nodes[i + 1].Count + 1 };
                    (arrivals[i + 1] ??= new Queue<int>()).Enqueue(from);
                }
            }

            nodes[i] = nodes[i] with { Items = items, Count = nodes[i].Count - moving };
        }

        return new SettledChain<T>(nodes, delivered);
    }
}

/// <summary>The buffers after a settle, and what reached the surface, each with the node it left from in this instant.</summary>
public sealed record SettledChain<T>(IReadOnlyList<FrameHold<T>> Holds, IReadOnlyList<(T Item, int FromNode)> Delivered);
