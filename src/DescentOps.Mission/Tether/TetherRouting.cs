using DescentOps.Engine.Components;
using DescentOps.Mission.Messages;
using DescentOps.Primitives.Time;
using DescentOps.Records;
using DescentOps.Records.Kinds;

namespace DescentOps.Mission.Tether;

/// <summary>
/// Where frames and commands go: by fibre while it is up, else up (or down) the relay chain as far as its hops close,
/// else into a buffer; what no buffer can take is lost and logged as <c>data.lost</c>.
/// </summary>
public static class TetherRouting
{
    /// <summary>
    /// Sends what can go, then offers the new frame, if any, to the probe end. A frame that finds the probe's buffer full
    /// (or no buffer and no path) is lost.
    /// </summary>
    public static TetherState Route(TetherDesign design, TetherState state, TelemetryFrame? incoming, ComponentContext context)
    {
        if (state.FibreUp)
        {
            var fibreDelay = design.FibreDelay(state);
            foreach (var held in state.ProbeHold.Items) context.Schedule(design.Ids.Station, fibreDelay, held, MissionPriority.Telemetry);
            var carried = state.FramesCarried + state.ProbeHold.Count + (incoming is null ? 0 : 1);
            if (incoming is not null) context.Schedule(design.Ids.Station, fibreDelay, incoming, MissionPriority.Telemetry);
            state = state with { ProbeHold = state.ProbeHold.Cleared(), FramesCarried = carried };
            return state.Relays.Any(r => r.Hold.Count > 0) ? RelaySettling.Settle(design, state, context) : state;
        }

        state = RelaySettling.Settle(design, state, context);
        if (incoming is null) return state;

        var chain = RelayChain.Of(design, state);
        // The frame being sent needs no buffer of its own when it can leave the probe at once.
        if (state.ProbeHold.Room > 0 || StoreAndForward.CanLeave(chain.Holds, chain.HopCloses, 0))
        {
            var hold = state.ProbeHold with { Capacity = state.ProbeHold.Capacity + 1 };
            state = RelaySettling.Settle(design, state with { ProbeHold = hold.Offer(incoming)! }, context);
            return state with { ProbeHold = state.ProbeHold with { Capacity = hold.Capacity - 1 } };
        }

        state = LostFrame(state, incoming, "probe", state.ProbeHold.Capacity == 0 ? "no path home and no buffer" : "the probe's buffer is full", context);
        return state with { FramesLost = state.FramesLost + 1 };
    }

    /// <summary>A telecommand from the station goes down the fibre, or down the relay chain, or waits at the surface end.</summary>
    public static TetherState CarryDown(TetherDesign design, TetherState state, Telecommand command, ComponentContext context)
    {
        if (state.FibreUp)
        {
            context.Schedule(design.Ids.Probe, design.FibreDelay(state), command, MissionPriority.Command);
            return state;
        }

        if (state.RelayPathUp == true && state.CommandHold.Count == 0)
        {
            var chain = RelayChain.Of(design, state);
            if (chain.PathUp)
            {
                context.Schedule(design.Ids.Probe, chain.DelayFrom(design, 0), command, MissionPriority.Command);
                return state;
            }
        }

        if (state.CommandHold.Offer(command) is { } held) return state with { CommandHold = held };
        context.Record(DataRecords.Lost, Severity.Alarm,
            RecordField.Of("kind", "telecommand"),
            RecordField.Of("command", command.Command.ToString()),
            RecordField.Of("origin", command.Origin),
            RecordField.Of("where", "surface"),
            RecordField.Of("cause", state.CommandHold.Capacity == 0 ? (state.Broken ? "tether broken" : "fibre link down") + ", no relay path and no buffer" : "the surface end's command buffer is full"));
        return state;
    }

    public static TetherState FlushCommands(TetherDesign design, TetherState state, SimDuration delay, ComponentContext context)
    {
        foreach (var command in state.CommandHold.Items) context.Schedule(design.Ids.Probe, delay, command, MissionPriority.Command);
        return state with { CommandHold = state.CommandHold.Cleared() };
    }

    public static TetherState LostFrame(TetherState state, TelemetryFrame frame, string where, string cause, ComponentContext context)
    {
        var episode = state.LossEpisode.After(frame.Sequence);
        context.Record(DataRecords.Lost, episode.Severity,
        [
            RecordField.Of("kind", "telemetry"),
            RecordField.Of("frame", frame.Sequence),
            RecordField.Of("where", where),
            RecordField.Of("cause", cause),
            .. episode.Fields(),
        ]);
        return state with { LossEpisode = episode };
    }
}
