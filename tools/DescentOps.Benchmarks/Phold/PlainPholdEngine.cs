using DescentOps.Engine.Randomness;
using DescentOps.Primitives.Identity;

namespace DescentOps.Benchmarks.Phold;

/// <summary>
/// PHOLD on a bare <see cref="PriorityQueue{TElement, TPriority}"/>: no components, no contexts, no rounds
/// handed out, just the loop. It is the ceiling the kernels are measured against. To produce the kernels'
/// exact order it keys events as they do, plus the generation a zero-delay event lands in (the kernels'
/// "next round of the same instant"), and it draws from the same per-process streams in the same order.
/// </summary>
public static class PlainPholdEngine
{
    public static PholdRun Run(PholdOptions options, DelayLaw law)
    {
        var ids = PholdModel.ProcessIds(options);
        var senderRank = OrdinalRanks(ids);
        var streams = ids.Select(id => new RandomStream(options.Seed, id)).ToArray();
        var hashes = Enumerable.Repeat(OrderChecksum.Start, ids.Length).ToArray();
        var sequences = new long[ids.Length];
        var queue = new PriorityQueue<PlainEvent, PlainKey>();
        var until = options.Until.Ticks;
        var reportsDone = new bool[ids.Length];

        void Schedule(long now, int generation, int sender, int target, long delayTicks, long token, byte priority)
        {
            var time = now + delayTicks;
            var key = new PlainKey(time, delayTicks == 0 ? generation + 1 : 0, priority, senderRank[sender], sequences[sender]++);
            queue.Enqueue(new PlainEvent(target, sender, token), key);
        }

        void Pass(long now, int generation, int self, long token)
        {
            var target = PholdDelay.DrawTarget(streams[self], ids.Length);
            var delay = PholdDelay.DrawDelay(streams[self], law, options.MeanDelayMs);
            Schedule(now, generation, self, target, delay.Ticks, token, Normal);
        }

        // The start is generation 0 at the epoch, as the kernels' first round.
        for (var p = 0; p < ids.Length; p++)
        {
            foreach (var token in PholdProcess.InitialTokens(p, options)) Pass(0, 0, p, token);
            Schedule(0, 0, p, p, until, ReportToken, Last);
        }

        long delivered = 0;
        // The kernels' first round hands out the starts at the epoch; this loop does them above, unqueued.
        long rounds = 1;
        long batches = ids.Length;
        var roundOfLastBatch = new long[ids.Length];
        var current = (Time: -1L, Generation: -1);
        while (queue.TryDequeue(out var e, out var key) && key.Time <= until)
        {
            if ((key.Time, key.Generation) != current)
            {
                current = (key.Time, key.Generation);
                rounds++;
            }

            if (roundOfLastBatch[e.Target] != rounds)
            {
                roundOfLastBatch[e.Target] = rounds;
                batches++;
            }

            if (e.Token == ReportToken)
            {
                reportsDone[e.Target] = true;
                continue;
            }

            delivered++;
            if (!reportsDone[e.Target]) hashes[e.Target] = OrderChecksum.Event(hashes[e.Target], key.Time, e.Token, e.Sender);
            Pass(key.Time, key.Generation, e.Target, e.Token);
        }

        return new PholdRun(delivered, OrderChecksum.Combine(hashes), rounds, batches);
    }

    // The kernels' EventPriority.Normal and .Last byte values.
    private const byte Normal = 128;
    private const byte Last = 255;
    private const long ReportToken = -1;

    private static int[] OrdinalRanks(ComponentId[] ids)
    {
        var order = ids.Select((id, i) => (id, i)).OrderBy(x => x.id.Name, StringComparer.Ordinal).ToArray();
        var ranks = new int[ids.Length];
        for (var r = 0; r < order.Length; r++) ranks[order[r].i] = r;
        return ranks;
    }

    private readonly record struct PlainEvent(int Target, int Sender, long Token);

    private readonly record struct PlainKey(long Time, int Generation, byte Priority, int SenderRank, long Sequence)
        : IComparable<PlainKey>
    {
        public int CompareTo(PlainKey other)
        {
            var c = Time.CompareTo(other.Time);
            if (c != 0) return c;
            c = Generation.CompareTo(other.Generation);
            if (c != 0) return c;
            c = Priority.CompareTo(other.Priority);
            if (c != 0) return c;
            c = SenderRank.CompareTo(other.SenderRank);
            return c != 0 ? c : Sequence.CompareTo(other.Sequence);
        }
    }
}
