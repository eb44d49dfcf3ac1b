using DescentOps.Engine.Components;
using DescentOps.Mission.Messages;
using DescentOps.Primitives.Time;
using DescentOps.Records;

namespace DescentOps.Mission.Tether;

/// <summary>What the link tells others: the probe its buffer's fill and its path (only when they change), and every record of a change the frame ledger.</summary>
public static class TetherReports
{
    /// <summary>The probe reports its buffer's fill and path in its next frame; it is told only when they change.</summary>
    public static TetherState Report(TetherDesign design, TetherState state, ComponentContext context)
    {
        var path = LinkPaths.Of(state);
        if (path != state.ReportedPath)
        {
            context.Schedule(design.Ids.Probe, SimDuration.Zero, new LinkPathChanged(path), MissionPriority.Telemetry);
            state = state with { ReportedPath = path };
        }

        var fill = state.ProbeHold.Fill;
        if (fill == state.ReportedFill) return state;
        context.Schedule(design.Ids.Probe, SimDuration.Zero, new LinkBufferFill(fill), MissionPriority.Telemetry);
        return state with { ReportedFill = fill };
    }

    /// <summary>
    /// The frame ledger carried by every record of a change in the link, so a post-mortem can see what the link held at
    /// that moment: produced = by fibre + by relays + held + lost.
    /// </summary>
    public static RecordField[] WithLedger(TetherState state, params RecordField[] fields) =>
    [
        .. fields,
        RecordField.Of("frames_produced", state.FramesProduced),
        RecordField.Of("frames_by_fibre", state.FramesCarried),
        RecordField.Of("frames_by_relays", state.FramesByRelays),
        RecordField.Of("frames_held", state.FramesHeld),
        RecordField.Of("frames_lost", state.FramesLost),
    ];
}
