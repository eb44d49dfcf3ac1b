using DescentOps.Engine.Components;
using DescentOps.Mission.Messages;
using DescentOps.Primitives.Time;
using DescentOps.Records;
using DescentOps.Records.Kinds;

namespace DescentOps.Mission.Station;

/// <summary>
/// The station's life and death: a station_failure fault kills it until the fault clears, the dose kills it for good,
/// and a reset (a discharge or a station_upset fault) stops it relaying until the recovery is over. What waits at a
/// station that dies is lost with it; with several landers the shared link home hears of each death and return.
/// </summary>
public static class StationLife
{
    public static StationState FailByFault(StationDesign design, StationState state, string fault, ComponentContext context)
    {
        if (state.Failed) return state;
        context.Record(StationRecords.Failed, Severity.Critical,
            RecordField.Of("fault", fault),
            RecordField.Of("frames_forwarded", state.FramesForwarded));
        TellLink(design, new StationDown(design.Ids.Lander ?? ""), context);
        return DropQueues(state, "station failed", context) with { Failed = true, FailureCause = "fault" };
    }

    /// <summary>A station_failure fault clears: the station works again, unless the dose has killed it meanwhile.</summary>
    public static StationState RecoverFromFault(StationDesign design, StationState state, string fault, ComponentContext context)
    {
        if (state.FailureCause == "dose") return state;
        context.Record(StationRecords.Recovered, Severity.Notice, RecordField.Of("fault", fault));
        TellLink(design, new StationUp(design.Ids.Lander ?? ""), context);
        return state with { Failed = false, FailureCause = null };
    }

    public static StationState DieOfDose(StationDesign design, StationState state, StationDoseLimit limit, ComponentContext context)
    {
        var doseGy = design.Dose!.SiliconDoseAfterGy(context.Now.SecondsSinceEpoch);
        context.Record(StationRecords.Failed, Severity.Critical,
            RecordField.Of("cause", "dose"),
            RecordField.Of("dose_gy_si", doseGy),
            RecordField.Of("failure_dose_gy_si", limit.FailureDoseGy),
            RecordField.Of("frames_forwarded", state.FramesForwarded),
            RecordField.Of("already_failed", state.Failed));
        if (!state.Failed) TellLink(design, new StationDown(design.Ids.Lander ?? ""), context);
        return DropQueues(state, "station failed", context) with { Failed = true, FailureCause = "dose" };
    }

    /// <summary>The next discharge of the Poisson process, drawn from the station's own stream.</summary>
    public static void ScheduleNextUpset(StationDesign design, ComponentContext context)
    {
        var waitS = context.Random.NextExponential(1.0 / design.Station.Charging!.MeanTimeBetweenUpsetsS);
        if (waitS < StationDesign.MaxTimerS) context.ScheduleSelf(SimDuration.FromSeconds(waitS), StationUpset.Instance, MissionPriority.Fault);
    }

    /// <summary>A reset: nothing is relayed until the recovery is over; an upset during a recovery extends it.</summary>
    public static StationState Upset(StationDesign design, StationState state, double recoveryS, string cause, ComponentContext context)
    {
        if (state.Failed) return state;
        var until = context.Now + SimDuration.FromSeconds(recoveryS);
        if (state.RecoveringUntil is { } earlier && earlier > until) until = earlier;
        context.Record(StationRecords.Upset, Severity.Warning,
            RecordField.Of("upset", state.Upsets + 1),
            RecordField.Of("cause", cause),
            RecordField.Of("recovery_time_s", recoveryS),
            RecordField.Of("arrivals", design.QueueWhileRecovering ? "queued" : "lost"),
            RecordField.Of("frames_queued", (long)state.FramesQueued));
        if (state.PendingService is { } pending) context.Cancel(pending);
        context.ScheduleSelf(until - context.Now, new StationUpsetOver(until), MissionPriority.Fault);
        return state with { Upsets = state.Upsets + 1, RecoveringUntil = until, PendingService = null };
    }

    /// <summary>The reset is over (unless a later upset pushed it on): the transmitter takes up what waits.</summary>
    public static StationState RecoverFromUpset(StationDesign design, StationState state, StationUpsetOver over, ComponentContext context)
    {
        if (state.RecoveringUntil != over.Until) return state;
        if (!state.Failed)
        {
            context.Record(StationRecords.UpsetRecovered, Severity.Notice,
                RecordField.Of("frames_queued", (long)state.FramesQueued),
                RecordField.Of("commands_queued", (long)state.CommandsQueued));
        }

        return StationTransmitter.Pump(design, state with { RecoveringUntil = null }, context);
    }

    /// <summary>The shared link home learns of this station's death or return (only with several landers).</summary>
    private static void TellLink(StationDesign design, object message, ComponentContext context)
    {
        if (design.Shared) context.Schedule(MissionIds.LinkHome, SimDuration.Zero, message, MissionPriority.Fault);
    }

    /// <summary>What waits at a station that dies is lost with it, and counted.</summary>
    private static StationState DropQueues(StationState state, string cause, ComponentContext context)
    {
        if (state.PendingService is { } pending) context.Cancel(pending);
        if (state.FramesQueued > 0)
        {
            context.Record(StationRecords.DataLost, Severity.Warning,
                RecordField.Of("data", "telemetry"),
                RecordField.Of("count", (long)state.FramesQueued),
                RecordField.Of("frame", state.Frames.Peek().Frame.Sequence),
                RecordField.Of("cause", cause));
        }

        foreach (var waiting in state.Commands) state = StationRelay.LoseCommand(state, waiting.Command, cause, context);
        return state with
        {
            Frames = [],
            FramesLost = state.FramesLost + state.FramesQueued,
            FramesQueued = 0,
            Commands = [],
            CommandsQueued = 0,
            PendingService = null,
            WaitingSince = null,
        };
    }
}
