using DescentOps.Engine.Components;
using DescentOps.Records;
using DescentOps.Mission.Autonomy;
using DescentOps.Mission.Messages;
using DescentOps.Mission.Procedures;
using DescentOps.Mission.Station;
using DescentOps.Primitives.Time;
using DescentOps.Rules.Compiled;
using DescentOps.Rules.Evaluation;
using DescentOps.Rules.Syntax;
using DescentOps.Scenarios.Model;
using DescentOps.Records.Kinds;

namespace DescentOps.Mission.Ground;

/// <summary>
/// The ground team's view of the mission: it knows only what the frames tell it, late by the tether, the station
/// and the light time; it notices when frame numbers jump; its rules' commands go back up the same way, a light
/// time to the station and then down the fibre, and can arrive too late. Its rules run on the frames' sampling time
/// and are moved on only by what reaches the ground: a rule's timer that ends at a sampling instant completes with
/// the first frame sampled then or later, never by the ground's own clock, which runs a downlink ahead of the frames
/// still on their way (waking the rules at it would refuse those frames and fire before the ground could know).
/// </summary>
public sealed class GroundTeamComponent : SimComponent<GroundState>
{
    private readonly RuleHost _rules;
    private readonly LanderIds _ids;
    private readonly SimDuration _uplink;
    private readonly IReadOnlyList<TimedTelecommand> _timed;
    private readonly IReadOnlyList<CompiledRuleSet> _uplinks;
    private readonly ProcedureDesk _procedures;

    /// <summary>How the ground hears its station; null unless a ground rule or procedure reads the station's points.</summary>
    private readonly StationHearing? _station;

    /// <param name="scenario">The mission: its distance home sets the uplink.</param>
    /// <param name="rules">The mission's rules; the ground ones run here.</param>
    /// <param name="timed">The mission's time-tagged telecommands; the ground sends those it holds at their times.</param>
    /// <param name="uplinks">Rule sets the ground uplinks at the scenario's times (<see cref="Scenario.RuleUplinks"/>).</param>
    /// <param name="ids">The ids of the lander whose frames it reads and whose station it commands; a single lander's by default.</param>
    /// <param name="procedures">The team's procedures, started by its rules or at their times.</param>
    public GroundTeamComponent(Scenario scenario, CompiledRuleSet rules, IReadOnlyList<TimedTelecommand>? timed = null, IReadOnlyList<CompiledRuleSet>? uplinks = null, LanderIds? ids = null, IReadOnlyList<CompiledProcedure>? procedures = null)
        : base((ids ?? LanderIds.Single).Ground, FailurePolicy.RestartFromLastState)
    {
        _ids = ids ?? LanderIds.Single;
        _rules = new RuleHost(rules, Placement.Ground);
        _uplink = SimDuration.FromSeconds(scenario.Body.DistanceToGroundM / StationComponent.SpeedOfLightMPerS);
        _timed = timed ?? [];
        _uplinks = uplinks ?? [];
        _procedures = new ProcedureDesk(procedures ?? []);
        _station = StationHearing.IsRead(rules, _uplinks, _procedures.Procedures) ? new StationHearing(scenario) : null;
        UplinkTimesS = [.. scenario.RuleUplinks.Select(u => u.AtS)];
        UplinkOrigins = [.. scenario.RuleUplinks.Select(u => u.FieldPath)];
    }

    private IReadOnlyList<double> UplinkTimesS { get; }

    private IReadOnlyList<string> UplinkOrigins { get; }

    public override GroundState InitialState => new(0, 0, 0, 0.0);

    public override GroundState Handle(GroundState state, object message, ComponentContext context)
    {
        _rules.RestoreTo(state.RulesVersion);
        _procedures.RestoreTo(state.ProceduresVersion);
        switch (message)
        {
            case RunStarted:
                for (var i = 0; i < _timed.Count; i++)
                {
                    if (_timed[i].From == TelecommandSender.Ground) context.ScheduleSelf(SimDuration.FromSeconds(_timed[i].AtS), new TimedTelecommandDue(i), MissionPriority.Command);
                }

                for (var k = 0; k < _uplinks.Count; k++) context.ScheduleSelf(SimDuration.FromSeconds(UplinkTimesS[k]), new RuleUplinkDue(k), MissionPriority.Command);
                for (var p = 0; p < _procedures.Procedures.Count; p++)
                {
                    if (_procedures.Procedures[p].StartAtS is { } startS) context.ScheduleSelf(SimDuration.FromSeconds(startS), new ProcedureDue(p), MissionPriority.Command);
                }

                return _station is null ? state : state with { Station = _station.Start(context) };
            case StationCarrier carrier:
                return HearStation(state, _station!.OnCarrier(state.Station!, carrier.On, context), carrier.On ? "carrier heard" : "carrier lost", context);
            case StationViewEdge edge:
                return HearStation(state, _station!.OnEdge(state.Station!, edge, context), edge.InView ? "home rose" : "home set", context);
            case StationSilenceOver:
                return HearStation(state with { StationSilence = null }, state.Station!.SilenceOver(context.Now), "silence past the timeout", context);
            case ProcedureDue due:
                return Procedures(state, _procedures.Start(due.Index, _procedures.Procedures[due.Index].FieldPath + ".start_at", context.Now, state.PeopleAnswer), context);
            case PeopleAtConsole:
                return state with { PeopleAnswer = true };
            case ProcedureStepAnswer answer:
                return Procedures(state, _procedures.Answer(answer.Procedure, answer.Step, answer.Confirmed, answer.By, answer.Number, context.Now), context);
            case ProcedureWake:
                return Procedures(state with { ProcedureWake = null }, _procedures.OnWake(context.Now), context);
            case TimedTelecommandDue due:
                Send(_timed[due.Index], context);
                return state;
            case RuleUplinkDue due:
                return UplinkRules(state, due.Index, context);
            case TelemetryFrame frame:
                var next = Receive(state, frame, context);
                // With the station's points read, they go with every frame, stamped with its sampling time.
                IReadOnlyList<TelemetrySample> samples = next.Station is { } watch ? [.. FrameSamples.Of(frame), .. StationHearing.Samples(watch, frame.SampledAt)] : [.. FrameSamples.Of(frame)];
                // The procedures see the frame before the rules can start one, so a step starts watching at the next frame.
                next = Procedures(next, _procedures.OnFrame(samples, context.Now), context);
                Uplink(ref next, _rules.OnSamples(samples, context), context);
                return next with { RulesVersion = _rules.Version };
            default:
                throw new InvalidOperationException($"The ground team cannot handle {message.GetType().Name}.");
        }
    }

    /// <summary>
    /// What the ground knows of its station moved on: the silence timer follows it, and a change goes to the
    /// procedures and the rules stamped with the latest frame's sampling time.
    /// </summary>
    private GroundState HearStation(GroundState state, StationWatch watch, string cause, ComponentContext context)
    {
        var changed = StationHearing.Settle(state.Station!, watch, state.StationSilence, state.LatestSampledAt, cause, context, out var timer);
        var next = state with { Station = watch, StationSilence = timer };
        if (changed is null) return next;
        next = Procedures(next, _procedures.OnFrame(changed, context.Now), context);
        Uplink(ref next, _rules.OnSamples(changed, context), context);
        return next with { RulesVersion = _rules.Version };
    }

    /// <summary>A time-tagged telecommand leaves the ground now and goes the way every ground command goes.</summary>
    private void Send(TimedTelecommand timed, ComponentContext context)
    {
        context.Record(CommandRecords.Sent, Severity.Notice,
            RecordField.Of("command", timed.Command.ToString()),
            RecordField.Of("origin", timed.Origin),
            RecordField.Of("uplink_s", _uplink.TotalSeconds));
        Uplink(context, new Telecommand(timed.Command, timed.Origin, "ground", context.Now), MissionPriority.Command);
    }

    /// <summary>
    /// The ground's rules are replaced now; the whole set goes up to the probe, whose autonomy loads its part when the
    /// upload arrives (or never, if the station or the fibre loses it).
    /// </summary>
    private GroundState UplinkRules(GroundState state, int index, ComponentContext context)
    {
        var set = _uplinks[index];
        var groundRules = _rules.Load(set, context);
        context.Record(RuleRecords.SetUplinked, Severity.Notice,
            RecordField.Of("origin", UplinkOrigins[index]),
            RecordField.Of("ground_rules", groundRules),
            RecordField.Of("board_rules", set.Rules.Count(r => r.Placement == Placement.Board)),
            RecordField.Of("uplink_s", _uplink.TotalSeconds));
        Uplink(context, new Telecommand(MissionTimeline.LoadRules(index), UplinkOrigins[index], "ground", context.Now), MissionPriority.Command);
        return state with { RulesVersion = _rules.Version };
    }

    private static GroundState Receive(GroundState state, TelemetryFrame frame, ComponentContext context)
    {
        var latency = (context.Now - frame.SampledAt).TotalSeconds;
        var missing = Math.Max(0, frame.Sequence - state.LastFrame - 1);
        if (missing > 0)
        {
            context.Record(GroundRecords.Gap, Severity.Warning,
                RecordField.Of("after_frame", state.LastFrame),
                RecordField.Of("missing", missing));
        }

        context.Record(GroundRecords.Telemetry, Severity.Debug,
            RecordField.Of("frame", frame.Sequence),
            RecordField.Of("latency_s", latency),
            RecordField.Of("depth_m", frame.Reading("probe.depth") ?? double.NaN),
            RecordField.Of("regime", frame.Regime));
        return state with
        {
            FramesReceived = state.FramesReceived + 1,
            LastFrame = Math.Max(state.LastFrame, frame.Sequence),
            FramesMissing = state.FramesMissing + missing,
            LastLatencyS = latency,
            LatestSampledAt = SimTime.Max(state.LatestSampledAt, frame.SampledAt),
        };
    }

    /// <summary>Sends the rules' commands up, except procedure starts, which the ground takes itself (into <paramref name="state"/>).</summary>
    private void Uplink(ref GroundState state, IReadOnlyList<Telecommand> commands, ComponentContext context)
    {
        foreach (var command in commands)
        {
            if (StartProcedureAction.ProcedureOf(command.Command) is { } procedure)
            {
                state = Procedures(state, _procedures.Start(_procedures.IndexOf(procedure), command.Origin, context.Now, state.PeopleAnswer), context);
                continue;
            }

            Uplink(context, command, MissionPriority.Command);
        }
    }

    /// <summary>Journals what the procedures did, sends their steps' commands up and keeps one timer for the next step that runs out of time.</summary>
    private GroundState Procedures(GroundState state, IReadOnlyList<ProcedureOutput> outputs, ComponentContext context)
    {
        if (outputs.Count == 0 && state.ProceduresVersion == _procedures.Version) return state;
        foreach (var command in ProcedureJournal.Write(outputs, context))
        {
            Uplink(context, command, MissionPriority.Command);
        }

        var wake = state.ProcedureWake;
        var due = _procedures.NextDeadline;
        if (outputs.Count > 0 || wake is null)
        {
            if (wake is { } pending) context.Cancel(pending);
            wake = due is { } at && at > context.Now ? context.ScheduleSelf(at - context.Now, ProcedureWake.Instance, MissionPriority.Command) : null;
        }

        return state with { ProceduresVersion = _procedures.Version, ProcedureWake = wake };
    }

    /// <summary>
    /// A command on its way up: alone, to the station one uplink later; one of several landers, to the shared link home,
    /// which sends it at the lander's turn (and adds the light time).
    /// </summary>
    private void Uplink(ComponentContext context, Telecommand command, Engine.Scheduling.EventPriority priority)
    {
        if (_ids.Lander is { } lander) context.Schedule(MissionIds.LinkHome, SimDuration.Zero, new UplinkBound(lander, command), priority);
        else context.Schedule(_ids.Station, _uplink, command, priority);
    }
}
