using DescentOps.Engine.Components;
using DescentOps.Mission.Messages;
using DescentOps.Primitives.Time;
using DescentOps.Records;
using DescentOps.Records.Kinds;

namespace DescentOps.Mission.Station;

/// <summary>
/// The station's transmitter schedule: one pending turn (<see cref="StationState.PendingService"/>) at the earliest
/// instant something waiting is ready, the station is up and home is in view (for a frame, long enough to send it
/// whole); at its turn, commands waiting go down the fibre and the oldest frame goes home. The start and the end of a
/// wait for a window or a reset are logged once each.
/// </summary>
public static class StationTransmitter
{
    public static bool Recovering(StationState state, ComponentContext context) => state.RecoveringUntil is { } until && context.Now < until;

    /// <summary>A command passes straight through when nothing waits ahead of it and the station can send now.</summary>
    public static bool CanPassNow(StationDesign design, StationState state, ComponentContext context) =>
        state.CommandsQueued == 0 && !Recovering(state, context) && design.Link.IsOpen(context.Now.SecondsSinceEpoch);

    /// <summary>Books the transmitter's next turn, unless one is booked, nothing waits or the station is dead.</summary>
    public static StationState Pump(StationDesign design, StationState state, ComponentContext context)
    {
        if (state.Failed || state.PendingService is not null || (state.FramesQueued == 0 && state.CommandsQueued == 0)) return state;
        var link = design.Link;
        var now = context.Now;
        var ready = state.RecoveringUntil is { } until && until > now ? until : now;
        var commandAt = state.CommandsQueued > 0 ? link.NextOpeningS(ready.SecondsSinceEpoch) : double.PositiveInfinity;
        var frameOwnReady = state.FramesQueued > 0 ? SimTime.Max(SimTime.Max(now, state.TransmitterFreeAt), state.Frames.Peek().ReadyAt) : now;
        var frameReady = SimTime.Max(frameOwnReady, ready);
        var frameAt = state.FramesQueued > 0 ? link.NextFrameStartS(frameReady.SecondsSinceEpoch) : double.PositiveInfinity;
        var atS = Math.Min(commandAt, frameAt);
        if (double.IsInfinity(atS) || atS - now.SecondsSinceEpoch >= StationDesign.MaxTimerS) return state;

        var at = SimTime.Max(now, CeilingTick(atS));
        if (state.WaitingSince is null && at > frameOwnReady)
        {
            context.Record(StationRecords.LinkWaiting, Severity.Notice,
                RecordField.Of("reason", Recovering(state, context) ? "station recovering from an upset" : "home out of view"),
                RecordField.Of("resumes_t_s", at.SecondsSinceEpoch),
                RecordField.Of("frames_queued", (long)state.FramesQueued),
                RecordField.Of("commands_queued", (long)state.CommandsQueued));
            state = state with { WaitingSince = now };
        }

        return state with { PendingService = context.ScheduleSelf(at - now, LinkService.Instance, MissionPriority.Telemetry) };
    }

    /// <summary>The transmitter's turn: commands waiting go down the fibre, then the oldest frame goes home if it fits the window.</summary>
    public static StationState Serve(StationDesign design, StationState state, ComponentContext context)
    {
        var link = design.Link;
        var nowS = context.Now.SecondsSinceEpoch;
        if (state.Failed || Recovering(state, context) || !link.IsOpen(nowS)) return state;
        if (state.WaitingSince is { } since)
        {
            context.Record(StationRecords.LinkResumed, Severity.Notice,
                RecordField.Of("waited_s", (context.Now - since).TotalSeconds),
                RecordField.Of("frames_queued", (long)state.FramesQueued),
                RecordField.Of("commands_queued", (long)state.CommandsQueued));
            state = state with { WaitingSince = null };
        }

        var commands = state.Commands;
        while (!commands.IsEmpty)
        {
            commands = commands.Dequeue(out var waiting);
            context.Record(StationRecords.CommandReleased, Severity.Notice,
                RecordField.Of("command", waiting.Command.Command.ToString()),
                RecordField.Of("origin", waiting.Command.Origin),
                RecordField.Of("held_s", (context.Now - waiting.ArrivedAt).TotalSeconds));
            context.Schedule(design.Ids.Tether, design.Forwarding, waiting.Command, MissionPriority.Command);
        }

        state = state with { Commands = commands, CommandsQueued = 0 };
        if (state.FramesQueued == 0 || context.Now < state.TransmitterFreeAt) return state;
        var head = state.Frames.Peek();
        if (context.Now < head.ReadyAt || link.NextFrameStartS(nowS) > nowS) return state;

        var onAir = SimDuration.FromSeconds(link.FrameTimeS);
        if (design.Shared) context.Schedule(MissionIds.LinkHome, SimDuration.Zero, new HomeBound(design.Ids.Lander!, head.Frame), MissionPriority.Telemetry);
        else context.Schedule(design.Ids.Ground, onAir + SimDuration.FromSeconds(design.OneWayLightTimeS), head.Frame, MissionPriority.Telemetry);
        return state with
        {
            Frames = state.Frames.Dequeue(),
            FramesQueued = state.FramesQueued - 1,
            FramesForwarded = state.FramesForwarded + 1,
            TransmitterFreeAt = context.Now + onAir,
        };
    }

    /// <summary>
    /// The tick at or after an instant in seconds; an instant within a thousandth of a tick of one is that tick, so that
    /// an instant read back from a tick does not move on by one.
    /// </summary>
    public static SimTime CeilingTick(double seconds)
    {
        var ticks = seconds * SimDuration.TicksPerSecond;
        var nearest = Math.Round(ticks);
        return new SimTime((long)(Math.Abs(ticks - nearest) < 1e-3 ? nearest : Math.Ceiling(ticks)));
    }
}
