namespace DescentOps.Mission.Tether;

/// <summary>
/// Moves held items up a chain of buffers in one instant. Node 0 is the probe end, the last node the relay nearest the
/// surface; hop i joins node i to node i + 1, and the last hop reaches the surface. A run of closed hops that reaches
/// the surface empties completely; a run that ends below an open hop passes what the node at its top has room for,
/// highest (oldest) items first. Nodes inside a run pass items straight through, so a relay needs no buffer of its own
/// to forward. Nothing is lost here: losses happen only where an item is offered to a full hold or a relay dies with
/// items in it. The work is proportional to what moves, not to what is held.
/// </summary>
public static class StoreAndForward
{
    /// <param name="holds">Buffers from the probe end upwards.</param>
    /// <param name="hopCloses">Whether hop i (node i to the node above it, or to the surface) closes now.</param>
    public static SettledChain<T> Settle<T>(IReadOnlyList<FrameHold<T>> holds, IReadOnlyList<bool> hopCloses)
    {
        Check(holds, hopCloses);
        var nodes = holds.ToArray();
        var delivered = new List<(T Item, int FromNode)>();
        var i = 0;
        while (i < nodes.Length)
        {
            if (!hopCloses[i])
            {
                i++;
                continue;
            }

            var top = RunTop(hopCloses, i);
            if (top == nodes.Length - 1)
            {
                for (var j = top; j >= i; j--)
                {
                    foreach (var item in nodes[j].Items) delivered.Add((item, j));
                    nodes[j] = nodes[j].Cleared();
                }
            }
            else
            {
                var target = top + 1;
                for (var j = top; j >= i && nodes[target].Room > 0; j--)
                {
                    var items = nodes[j].Items;
                    var moving = Math.Min(nodes[j].Count, nodes[target].Room);
                    for (var k = 0; k < moving; k++)
                    {
                        items = items.Dequeue(out var item);
                        nodes[target] = nodes[target] with { Items = nodes[target].Items.Enqueue(item), Count = nodes[target].Count + 1 };
                    }

                    nodes[j] = nodes[j] with { Items = items, Count = nodes[j].Count - moving };
                }
            }

            i = top + 1;
        }

        return new SettledChain<T>(nodes, delivered);
    }

    /// <summary>
    /// Whether an item added at the tail of <paramref name="node"/> would leave it in a settle: its hop closes and the run
    /// of closed hops above either reaches the surface or ends at a node with room for everything queued before it.
    /// </summary>
    public static bool CanLeave<T>(IReadOnlyList<FrameHold<T>> holds, IReadOnlyList<bool> hopCloses, int node)
    {
        Check(holds, hopCloses);
        if (!hopCloses[node]) return false;
        var top = RunTop(hopCloses, node);
        if (top == holds.Count - 1) return true;
        var ahead = 0L;
        for (var j = node; j <= top; j++) ahead += holds[j].Count;
        return holds[top + 1].Room > ahead;
    }

    private static int RunTop(IReadOnlyList<bool> hopCloses, int from)
    {
        var top = from;
        while (top + 1 < hopCloses.Count && hopCloses[top + 1]) top++;
        return top;
    }

    private static void Check<T>(IReadOnlyList<FrameHold<T>> holds, IReadOnlyList<bool> hopCloses)
    {
        ArgumentNullException.ThrowIfNull(holds);
        ArgumentNullException.ThrowIfNull(hopCloses);
        if (hopCloses.Count != holds.Count) throw new ArgumentException("One hop leaves every node.", nameof(hopCloses));
    }
}

/// <summary>The buffers after a settle, and what reached the surface, each with the node it was held in.</summary>
public sealed record SettledChain<T>(IReadOnlyList<FrameHold<T>> Holds, IReadOnlyList<(T Item, int FromNode)> Delivered);
