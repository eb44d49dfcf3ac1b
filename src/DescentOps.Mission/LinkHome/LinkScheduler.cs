using System.Collections.Immutable;
using DescentOps.Mission.Messages;
using DescentOps.Primitives.Time;
using DescentOps.Scenarios.Model;

namespace DescentOps.Mission.LinkHome;

/// <summary>
/// The shared link home as a pure function of its state: frames and commands offered by the stations wait in their
/// store; a service at an instant puts frames on free channels and sends commands up for the landers whose turn it is.
/// A lander's turn: its station is alive and sees home, its transmitter is free, and the policy gives it a channel
/// (priority: free channels in the order of precedence; contact plan: its own window, or the window of a dead station,
/// which goes to the others by precedence). A station has one transmitter, so a lander holds one channel at most.
/// Nothing is dropped but by a full store or a dying station, and both are reported to the caller.
/// </summary>
public sealed class LinkScheduler
{
    private readonly IReadOnlyList<LinkLanderSpec> _landers;
    private readonly IReadOnlyList<int> _order;
    private readonly ContactPlan? _plan;

    public LinkScheduler(IReadOnlyList<LinkLanderSpec> landers, int channels, LinkPolicy policy, IReadOnlyList<string> priority, ContactPlan? plan)
    {
        ArgumentOutOfRangeException.ThrowIfLessThan(channels, 1);
        if (policy == LinkPolicy.ContactPlan && plan is null) throw new ArgumentException("A contact-plan link needs its plan.", nameof(plan));
        _landers = landers;
        Channels = channels;
        Policy = policy;
        _plan = policy == LinkPolicy.ContactPlan ? plan : null;
        var names = landers.Select(l => l.Name).ToList();
        _order = [.. priority.Where(names.Contains).Concat(names.Where(n => !priority.Contains(n))).Select(n => names.IndexOf(n))];
    }

    public int Channels { get; }

    public LinkPolicy Policy { get; }

    /// <summary>The landers' names in the order of precedence.</summary>
    public IReadOnlyList<string> Precedence => [.. _order.Select(i => _landers[i].Name)];

    public LinkHomeState Start() => new([.. _landers.Select(l => LinkQueue.Empty(l.Name))], [.. Enumerable.Repeat<string?>(null, Channels)], [.. Enumerable.Repeat(SimTime.Epoch, Channels)], null);

    /// <summary>A frame reaches the link from a station: queued, or lost (returned cause) when the station is dead or its store full.</summary>
    public (LinkHomeState State, string? LostCause) Offer(LinkHomeState state, string lander, TelemetryFrame frame)
    {
        var i = state.Index(lander);
        var q = state.Landers[i] with { Offered = state.Landers[i].Offered + 1 };
        string? cause = !q.Alive ? "station failed" : q.FramesQueued >= _landers[i].FrameCapacity ? "station store full" : null;
        q = cause is null
            ? q with { Frames = q.Frames.Enqueue(frame), FramesQueued = q.FramesQueued + 1 }
            : q with { Lost = q.Lost + 1 };
        return (state with { Landers = state.Landers.SetItem(i, q) }, cause);
    }

    /// <summary>A command from the ground for a lander: queued for its turn, or lost (returned cause) when its station is dead or the queue full.</summary>
    public (LinkHomeState State, string? LostCause) OfferCommand(LinkHomeState state, string lander, Telecommand command)
    {
        var i = state.Index(lander);
        var q = state.Landers[i];
        string? cause = !q.Alive ? "station failed" : q.CommandsQueued >= _landers[i].CommandCapacity ? "station command queue full" : null;
        q = cause is null
            ? q with { Commands = q.Commands.Enqueue(command), CommandsQueued = q.CommandsQueued + 1 }
            : q with { CommandsLost = q.CommandsLost + 1 };
        return (state with { Landers = state.Landers.SetItem(i, q) }, cause);
    }

    /// <summary>A station dies: what it held is lost (returned), and its channel and windows are free for the others.</summary>
    public static (LinkHomeState State, IReadOnlyList<TelemetryFrame> Frames, IReadOnlyList<Telecommand> Commands) StationDown(LinkHomeState state, string lander)
    {
        var i = state.Index(lander);
        var q = state.Landers[i];
        var frames = q.Frames.ToList();
        var commands = q.Commands.ToList();
        var down = q with
        {
            Alive = false,
            Frames = [],
            FramesQueued = 0,
            Commands = [],
            CommandsQueued = 0,
            Lost = q.Lost + frames.Count,
            CommandsLost = q.CommandsLost + commands.Count,
        };
        return (state with { Landers = state.Landers.SetItem(i, down) }, frames, commands);
    }

    public static LinkHomeState StationUp(LinkHomeState state, string lander)
    {
        var i = state.Index(lander);
        return state with { Landers = state.Landers.SetItem(i, state.Landers[i] with { Alive = true }) };
    }

    /// <summary>The link's service at <paramref name="now"/>: every frame and command that may go now goes, and the next instant worth a look.</summary>
    public LinkRound Serve(LinkHomeState state, SimTime now)
    {
        var nowS = now.SecondsSinceEpoch;
        var holders = state.ChannelHolders.ToBuilder();
        var freeAt = state.ChannelFreeAt.ToBuilder();
        for (var c = 0; c < Channels; c++)
        {
            if (freeAt[c] <= now) holders[c] = null;
        }

        var landers = state.Landers.ToBuilder();
        var sent = new List<LinkTransmission>();
        var up = new List<(string, Telecommand)>();
        var progress = true;
        while (progress)
        {
            progress = false;
            foreach (var i in _order)
            {
                var q = landers[i];
                if (q.FramesQueued == 0 || q.TransmitterFreeAt > now || !MayStart(i, q, nowS)) continue;
                var channel = FreeChannel(freeAt, now);
                if (channel < 0 || !Granted(i, holders, landers, nowS)) continue;
                var frames = q.Frames.Dequeue(out var frame);
                var end = now + _landers[i].FrameTime;
                sent.Add(new LinkTransmission(q.Name, frame, channel, now, end));
                holders[channel] = end > now ? q.Name : null;
                freeAt[channel] = end;
                landers[i] = q with { Frames = frames, FramesQueued = q.FramesQueued - 1, Sent = q.Sent + 1, TransmitterFreeAt = end };
                progress = true;
            }
        }

        foreach (var i in _order)
        {
            var q = landers[i];
            if (q.CommandsQueued == 0 || !q.Alive || !_landers[i].InView(nowS)) continue;
            var holds = holders.Contains(q.Name);
            if (!holds && (FreeChannel(freeAt, now) < 0 || !Granted(i, holders, landers, nowS))) continue;
            up.AddRange(q.Commands.Select(c => (q.Name, c)));
            landers[i] = q with { Commands = [], CommandsQueued = 0 };
        }

        var next = state with { Landers = landers.ToImmutable(), ChannelHolders = holders.ToImmutable(), ChannelFreeAt = freeAt.ToImmutable() };
        return new LinkRound(next, sent, up, NextLook(next, now));
    }

    /// <summary>The station is alive and sees home long enough for a whole frame now.</summary>
    private bool MayStart(int i, LinkQueue q, double nowS) => q.Alive && _landers[i].NextFrameStartS(nowS) <= nowS;

    /// <summary>The policy gives lander <paramref name="i"/> a channel now (one is free).</summary>
    private bool Granted(int i, ImmutableArray<string?>.Builder holders, ImmutableArray<LinkQueue>.Builder landers, double nowS)
    {
        if (_plan is null) return true;
        var name = _landers[i].Name;
        if (_plan.IsOpen(name, nowS)) return true;
        // A window whose station is dead is free: the others take it by precedence, one channel each such window.
        var freed = _plan.OpenLanders(nowS).Count(l => !landers[IndexOf(landers, l)].Alive);
        var borrowed = holders.Count(h => h is not null && !_plan.IsOpen(h, nowS));
        return borrowed < freed;
    }

    private static int IndexOf(ImmutableArray<LinkQueue>.Builder landers, string name)
    {
        for (var i = 0; i < landers.Count; i++)
        {
            if (landers[i].Name == name) return i;
        }

        return -1;
    }

    private static int FreeChannel(ImmutableArray<SimTime>.Builder freeAt, SimTime now)
    {
        for (var c = 0; c < freeAt.Count; c++)
        {
            if (freeAt[c] <= now) return c;
        }

        return -1;
    }

    /// <summary>
    /// The next instant at which a service could send what still waits: a channel or transmitter freeing, a station
    /// coming into view, a lander's window opening, or a dead station's window opening for the others.
    /// </summary>
    private SimTime? NextLook(LinkHomeState state, SimTime now)
    {
        var nowS = now.SecondsSinceEpoch;
        var candidates = new List<double>();
        candidates.AddRange(state.ChannelFreeAt.Where(t => t > now).Select(t => t.SecondsSinceEpoch));
        var dead = state.Landers.Where(q => !q.Alive).Select(q => q.Name).ToList();
        for (var i = 0; i < _landers.Count; i++)
        {
            var q = state.Landers[i];
            if (!q.Alive || (q.FramesQueued == 0 && q.CommandsQueued == 0)) continue;
            if (q.TransmitterFreeAt > now) candidates.Add(q.TransmitterFreeAt.SecondsSinceEpoch);
            var spec = _landers[i];
            Func<double, double> view = q.FramesQueued > 0 ? spec.NextFrameStartS : spec.NextOpeningS;
            candidates.Add(_plan is null ? view(nowS) : InViewAndWindowS(spec, view, nowS));
            if (_plan is not null && dead.Count > 0) candidates.Add(_plan.NextStartOfAnyS(dead, nowS));
        }

        var after = candidates.Where(t => t > nowS && !double.IsInfinity(t) && !double.IsNaN(t)).DefaultIfEmpty(double.PositiveInfinity).Min();
        if (double.IsInfinity(after) || after > MaxLookS) return null;
        var at = CeilingTick(after);
        return at > now ? at : now + new SimDuration(1);
    }

    /// <summary>Beyond about 3000 years a timer's instant no longer fits the tick count's range with margin; nothing waits that long.</summary>
    private const double MaxLookS = 1e11;

    /// <summary>The first instant at or after <paramref name="tS"/> when the station sees home and its window is open (a bounded search).</summary>
    private double InViewAndWindowS(LinkLanderSpec spec, Func<double, double> view, double tS)
    {
        for (var step = 0; step < 256 && !double.IsInfinity(tS); step++)
        {
            var open = _plan!.NextOpeningS(spec.Name, tS);
            if (double.IsInfinity(open)) return open;
            var seen = view(open);
            if (_plan.IsOpen(spec.Name, seen)) return seen;
            tS = Math.Max(seen, open + 1e-3);
        }

        return double.PositiveInfinity;
    }

    /// <summary>The tick at or after an instant in seconds; within a thousandth of a tick of one, that tick.</summary>
    private static SimTime CeilingTick(double seconds)
    {
        var ticks = seconds * SimDuration.TicksPerSecond;
        var nearest = Math.Round(ticks);
        return new SimTime((long)(Math.Abs(ticks - nearest) < 1e-3 ? nearest : Math.Ceiling(ticks)));
    }
}
