using DescentOps.Engine.Components;
using DescentOps.Mission.Messages;
using DescentOps.Records;
using DescentOps.Records.Kinds;

namespace DescentOps.Mission.Station;

/// <summary>
/// What arrives at the station: a frame from the tether on its way home, a command from home on its way down. A dead
/// station loses both; a queued station holds them for its transmitter (<see cref="StationTransmitter"/>); otherwise
/// they pass at once, after the station's own handling delay.
/// </summary>
public static class StationRelay
{
    public static StationState OnFrame(StationDesign design, StationState state, TelemetryFrame frame, ComponentContext context)
    {
        if (state.Failed)
        {
            var episode = state.LossEpisode.After(frame.Sequence);
            context.Record(StationRecords.FrameLost, episode.Severity, [RecordField.Of("frame", frame.Sequence), .. episode.Fields()]);
            return state with { FramesLost = state.FramesLost + 1, LossEpisode = episode };
        }

        if (design.Queued) return StationTransmitter.Pump(design, Enqueue(design, state, frame, context), context);
        if (design.Shared) context.Schedule(MissionIds.LinkHome, design.Forwarding, new HomeBound(design.Ids.Lander!, frame), MissionPriority.Telemetry);
        else context.Schedule(design.Ids.Ground, design.DelayHome, frame, MissionPriority.Telemetry);
        return state with { FramesForwarded = state.FramesForwarded + 1 };
    }

    public static StationState OnCommand(StationDesign design, StationState state, Telecommand command, ComponentContext context)
    {
        if (state.Failed) return LoseCommand(state, command, "station failed", context);
        if (design.Queued && !StationTransmitter.CanPassNow(design, state, context))
        {
            return StationTransmitter.Pump(design, Enqueue(design, state, command, context), context);
        }

        context.Schedule(design.Ids.Tether, design.Forwarding, command, MissionPriority.Command);
        return state;
    }

    /// <summary>A command the station cannot pass on is lost, with an alarm saying where.</summary>
    public static StationState LoseCommand(StationState state, Telecommand command, string where, ComponentContext context)
    {
        context.Record(CommandRecords.Lost, Severity.Alarm,
            RecordField.Of("command", command.Command.ToString()),
            RecordField.Of("origin", command.Origin),
            RecordField.Of("where", where));
        return state with { CommandsLost = state.CommandsLost + 1 };
    }

    private static StationState Enqueue(StationDesign design, StationState state, TelemetryFrame frame, ComponentContext context)
    {
        var cause = StationTransmitter.Recovering(state, context) && !design.QueueWhileRecovering ? "station recovering from an upset"
            : state.FramesQueued >= design.Station.FrameQueueCapacity ? "frame queue full"
            : null;
        if (cause is not null)
        {
            context.Record(StationRecords.DataLost, Severity.Warning,
                RecordField.Of("data", "telemetry"),
                RecordField.Of("count", 1L),
                RecordField.Of("frame", frame.Sequence),
                RecordField.Of("cause", cause));
            return state with { FramesLost = state.FramesLost + 1 };
        }

        return state with { Frames = state.Frames.Enqueue(new QueuedFrame(frame, context.Now + design.Forwarding)), FramesQueued = state.FramesQueued + 1 };
    }

    private static StationState Enqueue(StationDesign design, StationState state, Telecommand command, ComponentContext context)
    {
        var recovering = StationTransmitter.Recovering(state, context);
        if (recovering && !design.QueueWhileRecovering) return LoseCommand(state, command, "station recovering from an upset", context);
        if (state.CommandsQueued >= design.Station.CommandQueueCapacity) return LoseCommand(state, command, "station command queue full", context);
        var opens = design.Link.NextOpeningS(context.Now.SecondsSinceEpoch);
        context.Record(StationRecords.CommandQueued, Severity.Notice,
            RecordField.Of("command", command.Command.ToString()),
            RecordField.Of("origin", command.Origin),
            RecordField.Of("queued", state.CommandsQueued + 1L),
            RecordField.Of("window_opens_t_s", opens),
            RecordField.Of("recovering", recovering));
        return state with { Commands = state.Commands.Enqueue(new QueuedCommand(command, context.Now)), CommandsQueued = state.CommandsQueued + 1 };
    }
}
