using System.Collections.Immutable;
using DescentOps.Engine.Components;
using DescentOps.Records;
using DescentOps.Mission.Messages;
using DescentOps.Mission.Running;
using DescentOps.Physics.Radiation;
using DescentOps.Primitives.Time;
using DescentOps.Scenarios.Model;
using DescentOps.Records.Kinds;

namespace DescentOps.Mission.Station;

/// <summary>
/// The surface station: it passes each frame from the tether home after its own handling delay plus the one-way light
/// time, and passes commands from home down the fibre. With the scenario's optional parts it also takes a dose and
/// dies at the failure dose drawn at the start, sends only while home is up (frames and commands wait in its queues
/// for the next window, at the link's data rate), resets after discharge upsets, and holds the probe on the surface
/// for a sterilising dwell. Without them it relays at once, as a plain relay, and fails only by a fault.
/// </summary>
public sealed class StationComponent : SimComponent<StationState>
{
    /// <summary>Speed of light in vacuum, m/s (exact by the SI definition of the metre).</summary>
    public const double SpeedOfLightMPerS = Physics.PhysicalConstants.SpeedOfLightMPerS;

    /// <summary>Events further off than this (about 300 years) never happen within a run and are not scheduled.</summary>
    private const double MaxTimerS = 1e10;

    private readonly StationModel _station;
    private readonly LanderIds _ids;
    private readonly SimDuration _delayHome;
    private readonly SimDuration _forwarding;
    private readonly StationDose? _dose;
    private readonly HomeLink _link;

    /// <summary>Whether frames and commands go through the queues: only when windows or upsets (discharges or faults) can hold them up.</summary>
    private readonly bool _queued;

    public StationComponent(Scenario scenario, LanderIds? ids = null)
        : base((ids ?? LanderIds.Single).Station, FailurePolicy.RestartFromLastState)
    {
        _ids = ids ?? LanderIds.Single;
        _station = scenario.Station;
        _link = new HomeLink(scenario);
        OneWayLightTimeS = _link.OneWayLightTimeS;
        _delayHome = SimDuration.FromSeconds(scenario.Station.ForwardingDelayS + OneWayLightTimeS);
        _forwarding = SimDuration.FromSeconds(scenario.Station.ForwardingDelayS);
        _dose = scenario.Station.Radiation is { } radiation ? new StationDose(radiation) : null;
        _queued = scenario.Station.Link is not null || scenario.Station.Charging is not null || scenario.Faults.Any(f => f.Kind == FaultKind.StationUpset);
    }

    public double OneWayLightTimeS { get; }

    /// <summary>The station's dose model, or null when the scenario gives no radiation.</summary>
    public StationDose? Dose => _dose;

    public HomeLink Link => _link;

    public override StationState InitialState => new(false, 0, 0, null, null, [], 0, [], 0, null, SimTime.Epoch, null, 0, 0);

    public override StationState Handle(StationState state, object message, ComponentContext context)
    {
        switch (message)
        {
            case RunStarted:
                context.Record(StationRecords.Started, Severity.Info, RecordField.Of("one_way_light_time_s", OneWayLightTimeS));
                Start(context);
                return state;
            case TelemetryFrame frame when state.Failed:
            {
                var episode = state.LossEpisode.After(frame.Sequence);
                context.Record(StationRecords.FrameLost, episode.Severity, [RecordField.Of("frame", frame.Sequence), .. episode.Fields()]);
                return state with { FramesLost = state.FramesLost + 1, LossEpisode = episode };
            }
            case TelemetryFrame frame when _queued:
                return Pump(Enqueue(state, frame, context), context);
            case TelemetryFrame frame:
                context.Schedule(_ids.Ground, _delayHome, frame, MissionPriority.Telemetry);
                return state with { FramesForwarded = state.FramesForwarded + 1 };
            case Telecommand command when state.Failed:
                return LoseCommand(state, command, "station failed", context);
            case Telecommand command when _queued && !CanPassNow(state, context):
                return Pump(Enqueue(state, command, context), context);
            case Telecommand command:
                context.Schedule(_ids.Tether, _forwarding, command, MissionPriority.Command);
                return state;
            case LinkService:
                return Pump(Serve(state with { PendingService = null }, context), context);
            case StationDoseLimit limit:
                return DieOfDose(state, limit, context);
            case StationUpset:
                ScheduleNextUpset(_station.Charging!, context);
                return Upset(state, _station.Charging!.RecoveryTimeS, "discharge", context);
            case FaultStarted { Fault.Kind: FaultKind.StationUpset } fault:
                return Upset(state, fault.Fault.DurationS!.Value, $"fault '{fault.Fault.Name}'", context);
            case FaultCleared { Fault.Kind: FaultKind.StationUpset }:
                return state;
            case StationUpsetOver over:
                return RecoverFromUpset(state, over, context);
            case DwellOver:
                EndDwell(context);
                return state;
            case FaultStarted { Fault.Kind: FaultKind.StationFailure } when state.Failed:
                return state;
            case FaultStarted { Fault.Kind: FaultKind.StationFailure } fault:
                context.Record(StationRecords.Failed, Severity.Critical,
                    RecordField.Of("fault", fault.Fault.Name),
                    RecordField.Of("frames_forwarded", state.FramesForwarded));
                return DropQueues(state, "station failed", context) with { Failed = true, FailureCause = "fault" };
            case FaultCleared { Fault.Kind: FaultKind.StationFailure } when state.FailureCause == "dose":
                return state;
            case FaultCleared { Fault.Kind: FaultKind.StationFailure } fault:
                context.Record(StationRecords.Recovered, Severity.Notice, RecordField.Of("fault", fault.Fault.Name));
                return state with { Failed = false, FailureCause = null };
            default:
                throw new InvalidOperationException($"The station cannot handle {message.GetType().Name}.");
        }
    }

    /// <summary>
    /// What the optional parts set going at the start. The draws come in a fixed order (failure dose, then the first
    /// upset) from the station's own stream, so a seed fixes both and nothing else shifts them.
    /// </summary>
    private void Start(ComponentContext context)
    {
        if (_dose is not null)
        {
            var failureDoseGy = _dose.DrawFailureDoseGy(context.Random);
            var lifeS = _dose.TimeToSiliconDoseS(failureDoseGy);
            context.Record(StationRecords.Radiation, Severity.Info,
                RecordField.Of("surface_dose_rate_gy_s", _dose.SurfaceDoseRateGyPerS),
                RecordField.Of("electronics_dose_rate_gy_si_s", _dose.SiliconDoseRateGyPerS),
                RecordField.Of("median_failure_dose_gy_si", _dose.MedianFailureDoseGy),
                RecordField.Of("median_life_s", _dose.TimeToSiliconDoseS(_dose.MedianFailureDoseGy)),
                RecordField.Of("failure_dose_gy_si", failureDoseGy),
                RecordField.Of("life_s", lifeS));
            if (lifeS < MaxTimerS)
            {
                context.ScheduleSelf(SimDuration.FromSeconds(lifeS), new StationDoseLimit(failureDoseGy), MissionPriority.Fault);
            }
        }

        if (_station.Link is not null)
        {
            context.Record(StationRecords.Link, Severity.Info,
                RecordField.Of("in_view_fraction", _link.InViewFraction),
                RecordField.Of("occultation_per_turn_s", _link.OccultationPerTurnS),
                RecordField.Of("open_fraction", _link.Windows!.OpenFraction),
                RecordField.Of("data_rate_bit_s", _link.DataRateBitPerS),
                RecordField.Of("frame_time_s", _link.FrameTimeS),
                RecordField.Of("open_now", _link.IsOpen(0.0)));
        }

        if (_station.Dwell is { } dwell)
        {
            context.Record(StationRecords.DwellStarted, Severity.Notice, RecordField.Of("dwell_s", dwell.DurationS), RecordField.Of("d_value_gy", dwell.DValueGy));
            context.ScheduleSelf(SimDuration.FromSeconds(dwell.DurationS), DwellOver.Instance, MissionPriority.Command);
        }

        if (_station.Charging is { } charging)
        {
            ScheduleNextUpset(charging, context);
        }
    }

    private static void ScheduleNextUpset(StationChargingModel charging, ComponentContext context)
    {
        var waitS = context.Random.NextExponential(1.0 / charging.MeanTimeBetweenUpsetsS);
        if (waitS < MaxTimerS) context.ScheduleSelf(SimDuration.FromSeconds(waitS), StationUpset.Instance, MissionPriority.Fault);
    }

    private bool Recovering(StationState state, ComponentContext context) => state.RecoveringUntil is { } until && context.Now < until;

    /// <summary>A command passes straight through when nothing waits ahead of it and the station can send now.</summary>
    private bool CanPassNow(StationState state, ComponentContext context) =>
        state.CommandsQueued == 0 && !Recovering(state, context) && _link.IsOpen(context.Now.SecondsSinceEpoch);

    private StationState Enqueue(StationState state, TelemetryFrame frame, ComponentContext context)
    {
        var cause = Recovering(state, context) && !QueueWhileRecovering ? "station recovering from an upset"
            : state.FramesQueued >= _station.FrameQueueCapacity ? "frame queue full"
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

        return state with { Frames = state.Frames.Enqueue(new QueuedFrame(frame, context.Now + _forwarding)), FramesQueued = state.FramesQueued + 1 };
    }

    private StationState Enqueue(StationState state, Telecommand command, ComponentContext context)
    {
        if (Recovering(state, context) && !QueueWhileRecovering) return LoseCommand(state, command, "station recovering from an upset", context);
        if (state.CommandsQueued >= _station.CommandQueueCapacity) return LoseCommand(state, command, "station command queue full", context);
        var opens = _link.NextOpeningS(context.Now.SecondsSinceEpoch);
        context.Record(StationRecords.CommandQueued, Severity.Notice,
            RecordField.Of("command", command.Command.ToString()),
            RecordField.Of("origin", command.Origin),
            RecordField.Of("queued", state.CommandsQueued + 1L),
            RecordField.Of("window_opens_t_s", opens),
            RecordField.Of("recovering", Recovering(state, context)));
        return state with { Commands = state.Commands.Enqueue(new QueuedCommand(command, context.Now)), CommandsQueued = state.CommandsQueued + 1 };
    }

    private static StationState LoseCommand(StationState state, Telecommand command, string where, ComponentContext context)
    {
        context.Record(CommandRecords.Lost, Severity.Alarm,
            RecordField.Of("command", command.Command.ToString()),
            RecordField.Of("origin", command.Origin),
            RecordField.Of("where", where));
        return state with { CommandsLost = state.CommandsLost + 1 };
    }

    /// <summary>
    /// Books the transmitter's next turn: the earliest instant at which something waiting is ready, the station is up,
    /// and home is in view (for a frame, long enough to send it whole). Logs the start of a wait for a window or a reset.
    /// </summary>
    private StationState Pump(StationState state, ComponentContext context)
    {
        if (state.Failed || state.PendingService is not null || (state.FramesQueued == 0 && state.CommandsQueued == 0)) return state;
        var now = context.Now;
        var ready = state.RecoveringUntil is { } until && until > now ? until : now;
        var commandAt = state.CommandsQueued > 0 ? _link.NextOpeningS(ready.SecondsSinceEpoch) : double.PositiveInfinity;
        var frameOwnReady = state.FramesQueued > 0 ? SimTime.Max(SimTime.Max(now, state.TransmitterFreeAt), state.Frames.Peek().ReadyAt) : now;
        var frameReady = SimTime.Max(frameOwnReady, ready);
        var frameAt = state.FramesQueued > 0 ? _link.NextFrameStartS(frameReady.SecondsSinceEpoch) : double.PositiveInfinity;
        var atS = Math.Min(commandAt, frameAt);
        if (double.IsInfinity(atS) || atS - now.SecondsSinceEpoch >= MaxTimerS) return state;

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
    private StationState Serve(StationState state, ComponentContext context)
    {
        var nowS = context.Now.SecondsSinceEpoch;
        if (state.Failed || Recovering(state, context) || !_link.IsOpen(nowS)) return state;
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
            context.Schedule(_ids.Tether, _forwarding, waiting.Command, MissionPriority.Command);
        }

        state = state with { Commands = commands, CommandsQueued = 0 };
        if (state.FramesQueued == 0 || context.Now < state.TransmitterFreeAt) return state;
        var head = state.Frames.Peek();
        if (context.Now < head.ReadyAt || _link.NextFrameStartS(nowS) > nowS) return state;

        var onAir = SimDuration.FromSeconds(_link.FrameTimeS);
        context.Schedule(_ids.Ground, onAir + SimDuration.FromSeconds(OneWayLightTimeS), head.Frame, MissionPriority.Telemetry);
        return state with
        {
            Frames = state.Frames.Dequeue(),
            FramesQueued = state.FramesQueued - 1,
            FramesForwarded = state.FramesForwarded + 1,
            TransmitterFreeAt = context.Now + onAir,
        };
    }

    private StationState DieOfDose(StationState state, StationDoseLimit limit, ComponentContext context)
    {
        var doseGy = _dose!.SiliconDoseAfterGy(context.Now.SecondsSinceEpoch);
        context.Record(StationRecords.Failed, Severity.Critical,
            RecordField.Of("cause", "dose"),
            RecordField.Of("dose_gy_si", doseGy),
            RecordField.Of("failure_dose_gy_si", limit.FailureDoseGy),
            RecordField.Of("frames_forwarded", state.FramesForwarded),
            RecordField.Of("already_failed", state.Failed));
        return DropQueues(state, "station failed", context) with { Failed = true, FailureCause = "dose" };
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

        foreach (var waiting in state.Commands) state = LoseCommand(state, waiting.Command, cause, context);
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

    /// <summary>A reset: nothing is relayed until the recovery is over; an upset during a recovery extends it.</summary>
    private StationState Upset(StationState state, double recoveryS, string cause, ComponentContext context)
    {
        if (state.Failed) return state;
        var until = context.Now + SimDuration.FromSeconds(recoveryS);
        if (state.RecoveringUntil is { } earlier && earlier > until) until = earlier;
        context.Record(StationRecords.Upset, Severity.Warning,
            RecordField.Of("upset", state.Upsets + 1),
            RecordField.Of("cause", cause),
            RecordField.Of("recovery_time_s", recoveryS),
            RecordField.Of("arrivals", QueueWhileRecovering ? "queued" : "lost"),
            RecordField.Of("frames_queued", (long)state.FramesQueued));
        if (state.PendingService is { } pending) context.Cancel(pending);
        context.ScheduleSelf(until - context.Now, new StationUpsetOver(until), MissionPriority.Fault);
        return state with { Upsets = state.Upsets + 1, RecoveringUntil = until, PendingService = null };
    }

    /// <summary>What the scenario's charging part says, or queue when only upset faults reset the station.</summary>
    private bool QueueWhileRecovering => _station.Charging?.QueueWhileRecovering ?? true;

    private StationState RecoverFromUpset(StationState state, StationUpsetOver over, ComponentContext context)
    {
        if (state.RecoveringUntil != over.Until) return state;
        if (!state.Failed)
        {
            context.Record(StationRecords.UpsetRecovered, Severity.Notice,
                RecordField.Of("frames_queued", (long)state.FramesQueued),
                RecordField.Of("commands_queued", (long)state.CommandsQueued));
        }

        return Pump(state with { RecoveringUntil = null }, context);
    }

    /// <summary>
    /// The dwell is over whatever became of the station: the exposed hardware took the unshielded surface dose for the
    /// whole dwell, which sets the log reduction; the station's own dose shows what the wait cost it.
    /// </summary>
    private void EndDwell(ComponentContext context)
    {
        var dwell = _station.Dwell!;
        var exposedDoseGy = DoseAccumulation.AccumulatedDoseGy(0.0, _dose!.SurfaceDoseRateGyPerS, dwell.DurationS);
        var logReduction = BioburdenReduction.LogReductionFromDose(exposedDoseGy, dwell.DValueGy);
        var stationDoseGy = _dose.SiliconDoseAfterGy(context.Now.SecondsSinceEpoch);
        context.Record(StationRecords.DwellEnded, Severity.Notice,
            RecordField.Of("dwell_s", dwell.DurationS),
            RecordField.Of("exposed_dose_gy", exposedDoseGy),
            RecordField.Of("log_reduction", logReduction),
            RecordField.Of("station_dose_gy_si", stationDoseGy),
            RecordField.Of("station_dose_share_of_median", stationDoseGy / _dose.MedianFailureDoseGy));
        context.Schedule(_ids.Probe, SimDuration.Zero, new DescentCleared(dwell.DurationS, logReduction), MissionPriority.Command);
    }

    /// <summary>
    /// The tick at or after an instant in seconds; an instant within a thousandth of a tick of one is that tick, so that
    /// an instant read back from a tick does not move on by one.
    /// </summary>
    private static SimTime CeilingTick(double seconds)
    {
        var ticks = seconds * SimDuration.TicksPerSecond;
        var nearest = Math.Round(ticks);
        return new SimTime((long)(Math.Abs(ticks - nearest) < 1e-3 ? nearest : Math.Ceiling(ticks)));
    }
}
