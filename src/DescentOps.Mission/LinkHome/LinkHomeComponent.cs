using DescentOps.Engine.Components;
using DescentOps.Mission.Messages;
using DescentOps.Physics.Station;
using DescentOps.Primitives.Time;
using DescentOps.Records;
using DescentOps.Records.Kinds;
using DescentOps.Scenarios.Model;

namespace DescentOps.Mission.LinkHome;

/// <summary>
/// The link home the landers of a scenario share (one component, id <c>link-home</c>): stations hand it their frames,
/// the ground desks their commands, and <see cref="LinkScheduler"/> decides who sends when. A frame reaches its
/// lander's ground desk its time on the air plus the light time after it starts; a command reaches its station one
/// light time after it goes up. Every record names the lander it concerns first, and every frame record carries the
/// lander's ledger (offered = sent + lost + queued).
/// </summary>
public sealed class LinkHomeComponent : SimComponent<LinkHomeState>
{
    private readonly LinkScheduler _scheduler;
    private readonly Dictionary<string, LanderIds> _ids;
    private readonly SimDuration _lightTime;

    /// <summary>Whether the mission desk hears every frame too (the scenario has mission rules).</summary>
    private readonly bool _desk;

    /// <param name="scenario">A scenario with landers and its shared link.</param>
    /// <param name="missionDesk">Whether the run has a mission desk (mission rules that compiled to at least one rule), which gets every lander's frames.</param>
    public LinkHomeComponent(Scenario scenario, bool missionDesk)
        : base(MissionIds.LinkHome, FailurePolicy.AbortRun)
    {
        var link = scenario.LinkHome ?? throw new ArgumentException("A shared link home belongs to a scenario with landers.", nameof(scenario));
        var specs = scenario.Landers.Select(l => LinkLanderSpec.From(l.Name, new Station.HomeLink(l.View), l.View.Station.FrameQueueCapacity, l.View.Station.CommandQueueCapacity)).ToList();
        _scheduler = new LinkScheduler(specs, link.Channels, link.Policy, link.Priority, link.Policy == LinkPolicy.ContactPlan ? new ContactPlan(link.Windows, link.RepeatS) : null);
        _ids = scenario.Landers.ToDictionary(l => l.Name, l => LanderIds.For(l.Name), StringComparer.Ordinal);
        _lightTime = SimDuration.FromSeconds(LightTime.OneWayS(scenario.Body.DistanceToGroundM));
        _desk = missionDesk;
    }

    public override LinkHomeState InitialState => _scheduler.Start();

    public override LinkHomeState Handle(LinkHomeState state, object message, ComponentContext context)
    {
        switch (message)
        {
            case RunStarted:
                context.Record(LinkRecords.Started, Severity.Info,
                    RecordField.Of("channels", _scheduler.Channels),
                    RecordField.Of("policy", _scheduler.Policy == LinkPolicy.ContactPlan ? "contact_plan" : "priority"),
                    RecordField.Of("precedence", string.Join(",", _scheduler.Precedence)),
                    RecordField.Of("one_way_light_time_s", _lightTime.TotalSeconds));
                return state;
            case HomeBound bound:
            {
                var (next, lost) = _scheduler.Offer(state, bound.Lander, bound.Frame);
                if (lost is not null) RecordLost(next, bound.Lander, bound.Frame.Sequence, 1, lost, context);
                return Serve(next, context);
            }
            case UplinkBound bound:
            {
                var (next, lost) = _scheduler.OfferCommand(state, bound.Lander, bound.Command);
                if (lost is not null) RecordCommandLost(bound.Lander, bound.Command, lost, context);
                return Serve(next, context);
            }
            case StationDown down:
            {
                var (next, frames, commands) = LinkScheduler.StationDown(state, down.Lander);
                context.Record(LinkRecords.StationDown, Severity.Warning, [RecordField.Of("lander", down.Lander), .. Ledger(next, down.Lander)]);
                if (frames.Count > 0) RecordLost(next, down.Lander, frames[0].Sequence, frames.Count, "station failed", context);
                foreach (var command in commands) RecordCommandLost(down.Lander, command, "station failed", context);
                return Serve(next, context);
            }
            case StationUp up:
                context.Record(LinkRecords.StationUp, Severity.Notice, RecordField.Of("lander", up.Lander));
                return Serve(LinkScheduler.StationUp(state, up.Lander), context);
            case LinkHomeDue:
                return Serve(state with { Pending = null }, context);
            default:
                throw new InvalidOperationException($"The link home cannot handle {message.GetType().Name}.");
        }
    }

    private LinkHomeState Serve(LinkHomeState state, ComponentContext context)
    {
        var round = _scheduler.Serve(state, context.Now);
        // The ledger as it stood after each frame went: the round's state is after all of them.
        var behind = round.Sent.GroupBy(s => s.Lander).ToDictionary(g => g.Key, g => g.Count(), StringComparer.Ordinal);
        foreach (var sent in round.Sent)
        {
            var after = --behind[sent.Lander];
            var onAir = sent.End - sent.Start;
            context.Schedule(_ids[sent.Lander].Ground, onAir + _lightTime, sent.Frame, MissionPriority.Telemetry);
            if (_desk) context.Schedule(MissionIds.MissionDesk, onAir + _lightTime, new LanderFrame(sent.Lander, sent.Frame), MissionPriority.Telemetry);
            context.Record(LinkRecords.Sent, Severity.Debug,
            [
                RecordField.Of("lander", sent.Lander),
                RecordField.Of("frame", sent.Frame.Sequence),
                RecordField.Of("channel", sent.Channel),
                RecordField.Of("on_air_s", onAir.TotalSeconds),
                RecordField.Of("age_s", (sent.Start - sent.Frame.SampledAt).TotalSeconds),
                RecordField.Of("channels_busy", (long)round.State.Busy(context.Now)),
                .. Ledger(round.State, sent.Lander, after),
            ]);
        }

        foreach (var (lander, command) in round.CommandsUp)
        {
            context.Schedule(_ids[lander].Station, _lightTime, command, MissionPriority.Command);
            context.Record(LinkRecords.CommandSent, Severity.Info,
                RecordField.Of("lander", lander),
                RecordField.Of("command", command.Command.ToString()),
                RecordField.Of("origin", command.Origin),
                RecordField.Of("held_s", (context.Now - command.IssuedAt).TotalSeconds));
        }

        var next = round.State;
        if (next.Pending is { } pending && round.NextLook is not null)
        {
            context.Cancel(pending);
            next = next with { Pending = null };
        }

        if (round.NextLook is { } at && next.Pending is null)
        {
            next = next with { Pending = context.ScheduleSelf(at - context.Now, LinkHomeDue.Instance, MissionPriority.Telemetry) };
        }

        return next;
    }

    private static void RecordLost(LinkHomeState state, string lander, long firstFrame, int count, string cause, ComponentContext context) =>
        context.Record(StationRecords.DataLost, Severity.Warning,
        [
            RecordField.Of("lander", lander),
            RecordField.Of("data", "telemetry"),
            RecordField.Of("count", (long)count),
            RecordField.Of("frame", firstFrame),
            RecordField.Of("cause", cause),
            .. Ledger(state, lander),
        ]);

    private static void RecordCommandLost(string lander, Telecommand command, string cause, ComponentContext context) =>
        context.Record(CommandRecords.Lost, Severity.Alarm,
            RecordField.Of("lander", lander),
            RecordField.Of("command", command.Command.ToString()),
            RecordField.Of("origin", command.Origin),
            RecordField.Of("where", cause));

    /// <summary>A lander's ledger, <paramref name="sentAfter"/> frames of the round before the state was reached.</summary>
    private static RecordField[] Ledger(LinkHomeState state, string lander, int sentAfter = 0)
    {
        var q = state.Landers[state.Index(lander)];
        return
        [
            RecordField.Of("frames_offered", q.Offered),
            RecordField.Of("frames_sent", q.Sent - sentAfter),
            RecordField.Of("frames_lost", q.Lost),
            RecordField.Of("frames_queued", (long)q.FramesQueued + sentAfter),
        ];
    }
}
