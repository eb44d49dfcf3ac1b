using DescentOps.Mission.LinkHome;
using DescentOps.Mission.Messages;
using DescentOps.Primitives.Time;
using DescentOps.Scenarios.Model;

namespace DescentOps.Mission.Tests.Landers;

/// <summary>
/// The shared link home's scheduler alone, driven by a small event loop: it never carries more frames at once than it
/// has channels, a station never sends two frames at once, nobody sends outside their turn, and nothing is lost
/// silently: every frame offered is sent, lost with a cause, or still queued, and the ledger says so.
/// </summary>
public sealed class LinkSchedulerTests
{
    private const double Hour = 3600;
    private static readonly string[] Names = ["tarn", "brack", "fell"];

    [Theory]
    [InlineData(1, false, 11)]
    [InlineData(2, false, 12)]
    [InlineData(1, true, 13)]
    [InlineData(2, true, 14)]
    [InlineData(3, false, 15)]
    public void The_link_never_carries_more_than_its_channels_and_loses_nothing_silently(int channels, bool contactPlan, int seed)
    {
        var random = new Random(seed);
        // Frame times of a few seconds to a few minutes (so channels do fill), stores of 5 to 40 frames.
        var specs = Names.Select(n => LinkLanderSpec.AlwaysInView(n, SimDuration.FromSeconds(random.Next(1, 300)), random.Next(5, 40))).ToList();
        ContactWindowModel[] windows = [new("tarn", 0, 6 * Hour), new("brack", 6 * Hour, 14 * Hour), new("fell", 14 * Hour, 24 * Hour)];
        var scheduler = new LinkScheduler(specs, channels, contactPlan ? LinkPolicy.ContactPlan : LinkPolicy.Priority, ["brack"], contactPlan ? new ContactPlan(windows, 24 * Hour) : null);
        var plan = new ContactPlan(windows, 24 * Hour);

        // Three days of frames every 2 to 20 minutes per lander, brack's station dead from day 1 to day 1.5.
        var offers = new List<(double T, string Lander)>();
        foreach (var name in Names)
        {
            for (var t = random.Next(0, 600) * 1.0; t < 3 * 24 * Hour; t += random.Next(120, 1200)) offers.Add((t, name));
        }

        var loop = new Loop(scheduler);
        loop.Run(offers, [(24 * Hour, "brack", false), (36 * Hour, "brack", true)], 4 * 24 * Hour);

        // At most `channels` frames on the air at any instant: a sweep over the transmissions' starts and ends.
        var edges = loop.Sent.Where(s => s.End > s.Start).SelectMany(s => new[] { (s.Start.Ticks, 1), (s.End.Ticks, -1) }).OrderBy(e => e.Item1).ThenBy(e => e.Item2);
        var onAir = 0;
        var most = 0;
        foreach (var (_, step) in edges)
        {
            onAir += step;
            most = Math.Max(most, onAir);
        }

        Assert.InRange(most, 1, channels);
        foreach (var name in Names)
        {
            var own = loop.Sent.Where(s => s.Lander == name).OrderBy(s => s.Start).ToList();
            // One transmitter per station: its frames never overlap, and go in the order they came.
            for (var i = 1; i < own.Count; i++)
            {
                Assert.True(own[i].Start >= own[i - 1].End, $"{name} sent two frames at once at {own[i].Start}");
                Assert.True(own[i].Frame.Sequence > own[i - 1].Frame.Sequence);
            }

            // The ledger closes and agrees with what happened: offered = sent + lost + queued.
            var q = loop.State.Landers[loop.State.Index(name)];
            var offered = offers.Count(o => o.Lander == name);
            Assert.Equal(offered, q.Offered);
            Assert.Equal(own.Count, q.Sent);
            Assert.Equal(loop.Lost.Count(l => l.Lander == name), q.Lost);
            Assert.Equal(q.Offered, q.Sent + q.Lost + q.FramesQueued);
            // Every frame accounted for exactly once.
            var seen = own.Select(s => s.Frame.Sequence).Concat(loop.Lost.Where(l => l.Lander == name).Select(l => l.Sequence)).Concat(q.Frames.Select(f => f.Sequence)).ToList();
            Assert.Equal(offered, seen.Distinct().Count());
            Assert.Equal(offered, seen.Count);
        }

        // Nobody sends while its station is dead; under the contact plan, only in its own window or a dead station's.
        Assert.DoesNotContain(loop.Sent, s => s.Lander == "brack" && s.Start.SecondsSinceEpoch >= 24 * Hour && s.Start.SecondsSinceEpoch < 36 * Hour);
        if (contactPlan)
        {
            foreach (var s in loop.Sent)
            {
                var t = s.Start.SecondsSinceEpoch;
                var brackDead = t >= 24 * Hour && t < 36 * Hour;
                Assert.True(plan.IsOpen(s.Lander, t) || (brackDead && plan.IsOpen("brack", t)), $"{s.Lander} sent at {t / Hour:F3} h outside its turn");
            }
        }
    }

    [Fact]
    public void By_priority_the_first_lander_empties_its_store_before_the_next_sends()
    {
        var specs = new[] { LinkLanderSpec.AlwaysInView("tarn", SimDuration.FromSeconds(10)), LinkLanderSpec.AlwaysInView("brack", SimDuration.FromSeconds(10)) };
        var loop = new Loop(new LinkScheduler(specs, 1, LinkPolicy.Priority, ["brack", "tarn"], null));
        loop.Run([(0, "tarn"), (0, "tarn"), (0, "brack"), (0, "brack"), (0, "brack")], [], 3600);

        // One channel, frames of 10 s: brack's three frames at 0, 10 and 20 s, then tarn's two at 30 and 40 s.
        Assert.Equal(["brack@0", "brack@10", "brack@20", "tarn@30", "tarn@40"], loop.Sent.Select(s => $"{s.Lander}@{s.Start.SecondsSinceEpoch:0}"));
    }

    [Fact]
    public void A_dead_station_s_window_goes_to_the_others_by_precedence()
    {
        var specs = Names.Select(n => LinkLanderSpec.AlwaysInView(n, SimDuration.FromSeconds(60))).ToArray();
        ContactWindowModel[] windows = [new("tarn", 0, 10 * Hour), new("brack", 10 * Hour, 20 * Hour), new("fell", 20 * Hour, 30 * Hour)];
        var loop = new Loop(new LinkScheduler(specs, 1, LinkPolicy.ContactPlan, ["fell", "brack"], new ContactPlan(windows, null)));
        // brack and fell have a frame waiting from the start; tarn's station dies at 1 h.
        loop.Run([(0, "brack"), (0, "fell")], [(Hour, "tarn", false)], 40 * Hour);

        // While tarn lives its window is its own; from 1 h it is free, and fell comes before brack.
        Assert.Equal(["fell@3600", "brack@3660"], loop.Sent.Select(s => $"{s.Lander}@{s.Start.SecondsSinceEpoch:0}"));
    }

    [Fact]
    public void A_full_store_loses_the_frame_in_hand_and_says_so()
    {
        var specs = new[] { new LinkLanderSpec("tarn", SimDuration.FromSeconds(1), t => t >= 10 * Hour, t => Math.Max(t, 10 * Hour), t => Math.Max(t, 10 * Hour), 2, 5) };
        var loop = new Loop(new LinkScheduler(specs, 1, LinkPolicy.Priority, [], null));
        loop.Run([(0, "tarn"), (Hour, "tarn"), (2 * Hour, "tarn"), (3 * Hour, "tarn"), (4 * Hour, "tarn")], [], 20 * Hour);

        // Home out of view until 10 h, a store of 2: frames 3, 4 and 5 are lost as they come, 1 and 2 go at 10 h.
        Assert.Equal([3L, 4L, 5L], loop.Lost.Select(l => l.Sequence));
        Assert.All(loop.Lost, l => Assert.Equal("station store full", l.Cause));
        Assert.Equal(["1@36000", "2@36001"], loop.Sent.Select(s => $"{s.Frame.Sequence}@{s.Start.SecondsSinceEpoch:0}"));
    }

    [Fact]
    public void Commands_wait_for_their_lander_s_window_and_then_go_together()
    {
        var specs = new[] { LinkLanderSpec.AlwaysInView("tarn", SimDuration.FromSeconds(5)), LinkLanderSpec.AlwaysInView("brack", SimDuration.FromSeconds(5)) };
        var scheduler = new LinkScheduler(specs, 1, LinkPolicy.ContactPlan, [], new ContactPlan([new("tarn", 0, Hour), new("brack", Hour, 2 * Hour)], 2 * Hour));
        var state = scheduler.Start();
        var command = new Telecommand(new Rules.Compiled.CommandAction(new("probe"), "pause_descent", []), "test", "ground", SimTime.Epoch);
        (state, var cause) = scheduler.OfferCommand(state, "brack", command);
        Assert.Null(cause);
        (state, _) = scheduler.OfferCommand(state, "brack", command);

        var early = scheduler.Serve(state, SimTime.FromSecondsSinceEpoch(60));
        Assert.Empty(early.CommandsUp);
        Assert.Equal(SimTime.FromSecondsSinceEpoch(Hour), early.NextLook);
        var inWindow = scheduler.Serve(early.State, SimTime.FromSecondsSinceEpoch(Hour));
        Assert.Equal(["brack", "brack"], inWindow.CommandsUp.Select(c => c.Lander));
    }

    /// <summary>Drives the scheduler the way its component does: serve after every change and at every look it asks for.</summary>
    private sealed class Loop(LinkScheduler scheduler)
    {
        public LinkHomeState State { get; private set; } = scheduler.Start();

        public List<LinkTransmission> Sent { get; } = [];

        public List<(string Lander, long Sequence, string Cause)> Lost { get; } = [];

        public void Run(List<(double T, string Lander)> offers, IReadOnlyList<(double T, string Lander, bool Up)> stations, double untilS)
        {
            var events = offers.Select((o, i) => (o.T, Order: i, Act: (Action<SimTime>)(_ => Offer(o.Lander, o.T))))
                .Concat(stations.Select((s, i) => (s.T, Order: offers.Count + i, Act: (Action<SimTime>)(_ => Station(s.Lander, s.Up)))))
                .OrderBy(e => e.T).ThenBy(e => e.Order).ToList();
            SimTime? look = null;
            var next = 0;
            while (true)
            {
                var eventAt = next < events.Count ? SimTime.FromSecondsSinceEpoch(events[next].T) : (SimTime?)null;
                var at = look is { } l && (eventAt is null || l < eventAt) ? l : eventAt;
                if (at is not { } now || now.SecondsSinceEpoch > untilS) return;
                while (next < events.Count && SimTime.FromSecondsSinceEpoch(events[next].T) == now) events[next++].Act(now);
                var round = scheduler.Serve(State, now);
                State = round.State;
                Sent.AddRange(round.Sent);
                look = round.NextLook;
                Assert.True(look is null || look > now, "the next look is always later");
            }
        }

        private readonly Dictionary<string, long> _sequence = new(StringComparer.Ordinal);

        private void Offer(string lander, double t)
        {
            var n = _sequence[lander] = _sequence.GetValueOrDefault(lander) + 1;
            var (state, cause) = scheduler.Offer(State, lander, new TelemetryFrame(n, SimTime.FromSecondsSinceEpoch(t), "Melting", [], 0, 0));
            State = state;
            if (cause is not null) Lost.Add((lander, n, cause));
        }

        private void Station(string lander, bool up)
        {
            if (up)
            {
                State = LinkScheduler.StationUp(State, lander);
                return;
            }

            var (state, frames, _) = LinkScheduler.StationDown(State, lander);
            State = state;
            Lost.AddRange(frames.Select(f => (lander, f.Sequence, "station failed")));
        }
    }
}
