using DescentOps.Engine.Scheduling;
using DescentOps.Primitives.Identity;
using DescentOps.Primitives.Time;

namespace DescentOps.Engine.Tests;

public sealed class FutureEventListTests
{
    private static readonly ComponentId Alpha = new("alpha");
    private static readonly ComponentId Beta = new("beta");
    private static readonly ComponentId Sink = new("sink");

    // Times, priorities and sequence numbers below are labels: only their order matters, and each is chosen
    // so that a different tie-break rule would produce a different order.
    private static SimEvent At(long ticks, byte priority, ComponentId sender, long sequence) =>
        new(new EventKey(new SimTime(ticks), new EventPriority(priority), sender, sequence), Sink, $"{sender}#{sequence}");

    [Fact]
    public void Events_at_one_instant_come_out_by_priority_then_sender_then_sequence_and_later_ones_wait()
    {
        var list = new FutureEventList();
        var atFive = new[]
        {
            At(5, 0, Beta, 9),     // lowest priority value first, whatever the sender
            At(5, 128, Alpha, 2),
            At(5, 128, Alpha, 7),  // same sender: its sequence decides
            At(5, 128, Beta, 1),   // "alpha" < "beta" ordinally, so beta's lower sequence still comes after
            At(5, 255, Alpha, 0),
        };
        list.Add(At(6, 0, Alpha, 100)); // later instant, top priority: must wait for its own round
        foreach (var index in new[] { 3, 0, 4, 2, 1 }) list.Add(atFive[index]);

        var round = new List<SimEvent>();
        Assert.True(list.TryTakeRound(round, out var time));

        Assert.Equal(new SimTime(5), time);
        Assert.Equal(atFive, round);
        Assert.Equal(1, list.Count);
    }

    [Fact]
    public void A_cancelled_event_is_never_delivered_and_leaves_the_count()
    {
        var list = new FutureEventList();
        var kept = At(1, 128, Alpha, 0);
        var dropped = At(1, 128, Alpha, 1);
        list.Add(kept);
        list.Add(dropped);

        Assert.True(list.Cancel(dropped.Key.Handle));
        Assert.Equal(1, list.Count);

        var round = new List<SimEvent>();
        Assert.True(list.TryTakeRound(round, out _));
        Assert.Equal([kept], round);
        Assert.False(list.TryTakeRound(round, out _));
    }

    [Fact]
    public void A_cancelled_head_does_not_set_the_next_time()
    {
        var list = new FutureEventList();
        var early = At(1, 128, Alpha, 0);
        list.Add(early);
        list.Add(At(9, 128, Alpha, 1));
        list.Cancel(early.Key.Handle);

        Assert.True(list.TryPeekTime(out var next));
        Assert.Equal(new SimTime(9), next);
    }

    [Fact]
    public void Cancelling_after_delivery_or_twice_returns_false()
    {
        var list = new FutureEventList();
        var delivered = At(1, 128, Alpha, 0);
        var twice = At(2, 128, Alpha, 1);
        list.Add(delivered);
        list.Add(twice);
        list.TryTakeRound(new List<SimEvent>(), out _);

        Assert.False(list.Cancel(delivered.Key.Handle));
        Assert.True(list.Cancel(twice.Key.Handle));
        Assert.False(list.Cancel(twice.Key.Handle));
        Assert.False(list.Cancel(new EventHandle(Beta, 42))); // never scheduled
    }

    [Fact]
    public void Scheduling_the_same_sender_sequence_twice_is_refused()
    {
        var list = new FutureEventList();
        list.Add(At(1, 128, Alpha, 0));

        Assert.Throws<InvalidOperationException>(() => list.Add(At(2, 0, Alpha, 0)));
    }

    [Fact]
    public void A_zero_delay_event_added_while_a_round_is_out_goes_to_the_next_round_at_the_same_instant()
    {
        var list = new FutureEventList();
        list.Add(At(3, 128, Beta, 0));
        var round = new List<SimEvent>();
        list.TryTakeRound(round, out _);

        // Top priority and an earlier sender than the delivered one: in the same round it would have come first.
        var zeroDelay = At(3, 0, Alpha, 0);
        list.Add(zeroDelay);

        Assert.True(list.TryTakeRound(round, out var time));
        Assert.Equal(new SimTime(3), time);
        Assert.Equal([zeroDelay], round);
    }

    [Fact]
    public void Time_never_goes_backwards_and_cancelled_events_never_appear_over_a_long_random_workload()
    {
        // A fixed seed makes any failure reproducible; the sizes (8 senders, 20,000 rounds, delays 0..4 ticks)
        // make ties and zero delays common, which is what the order must survive.
        var random = new Random(20260212);
        var senders = Enumerable.Range(0, 8).Select(i => new ComponentId($"s{i}")).ToArray();
        var sequences = new long[senders.Length];
        var list = new FutureEventList();
        var live = new List<EventHandle>();
        var cancelled = new HashSet<EventHandle>();
        var now = SimTime.Epoch;

        SimEvent Next(SimTime time)
        {
            var s = random.Next(senders.Length);
            return new SimEvent(
                new EventKey(time + new SimDuration(random.Next(5)), new EventPriority((byte)random.Next(3)), senders[s], sequences[s]++),
                Sink,
                "x");
        }

        for (var i = 0; i < 200; i++)
        {
            var e = Next(now);
            list.Add(e);
            live.Add(e.Key.Handle);
        }

        var round = new List<SimEvent>();
        var rounds = 0;
        while (rounds < 20_000 && list.TryTakeRound(round, out var time))
        {
            rounds++;
            Assert.True(time >= now, $"round {rounds} went back from {now} to {time}");
            now = time;
            for (var i = 1; i < round.Count; i++) Assert.True(round[i - 1].Key.CompareTo(round[i].Key) < 0);

            foreach (var delivered in round)
            {
                Assert.Equal(time, delivered.Key.Time);
                Assert.DoesNotContain(delivered.Key.Handle, cancelled);
                for (var child = random.Next(3); child > 0; child--) // 0, 1 or 2 children: the population drifts but stays alive
                {
                    var e = Next(now);
                    list.Add(e);
                    live.Add(e.Key.Handle);
                }
            }

            if (live.Count > 0 && random.Next(4) == 0)
            {
                var victim = live[random.Next(live.Count)];
                if (list.Cancel(victim)) cancelled.Add(victim);
            }
        }

        Assert.True(rounds > 1_000, $"the workload died out after {rounds} rounds, too few to mean anything");
    }
}
