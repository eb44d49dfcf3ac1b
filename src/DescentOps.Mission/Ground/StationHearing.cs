using DescentOps.Engine.Components;
using DescentOps.Engine.Scheduling;
using DescentOps.Mission.Procedures;
using DescentOps.Mission.Station;
using DescentOps.Primitives.Time;
using DescentOps.Records;
using DescentOps.Records.Kinds;
using DescentOps.Rules.Compiled;
using DescentOps.Rules.Evaluation;
using DescentOps.Rules.Syntax;
using DescentOps.Scenarios.Model;

namespace DescentOps.Mission.Ground;

/// <summary>
/// How the ground hears its station (<see cref="StationWatch"/>) and tells its rules and procedures: home's rising and
/// setting come from the link's geometry, which the ground predicts, a light time late; the carrier's changes come from
/// the station (<see cref="StationBeacon"/>). The points <c>station.alive</c> and <c>station.in_view</c> are stamped
/// with the sampling time of the latest frame the ground holds, because the ground's rules run on the frames' sampling
/// time and a later stamp (the ground's own clock) would refuse the frames still on their way. They go with every
/// frame (stamped with its sampling time) and, when they change, alone.
/// </summary>
public sealed class StationHearing
{
    /// <summary>Past a window's end by this much the link is surely closed (its edges carry microseconds of slack).</summary>
    private const double PastEdgeS = 1e-3;

    private readonly HomeLink _link;
    private readonly SimDuration _light;
    private readonly SimDuration _timeout;

    public StationHearing(Scenario scenario)
    {
        _link = new HomeLink(scenario);
        _light = SimDuration.FromSeconds(_link.OneWayLightTimeS);
        _timeout = SimDuration.FromSeconds(scenario.Station.SilenceTimeoutS);
    }

    /// <summary>Whether a ground rule (of the scenario's set or an uplinked one) or a procedure reads a station point.</summary>
    public static bool IsRead(CompiledRuleSet rules, IEnumerable<CompiledRuleSet> uplinks, IEnumerable<CompiledProcedure> procedures)
    {
        static bool Reads(CompiledRule? rule) => rule is not null && rule.Placement == Placement.Ground
            && ConditionLeaf.Of(rule.Condition).Any(l => l.Check is StateCondition { Point: StationWatch.AlivePoint or StationWatch.InViewPoint });
        return rules.Rules.Concat(uplinks.SelectMany(u => u.Rules)).Any(Reads)
            || procedures.SelectMany(p => p.Steps).Any(s => Reads(s.WaitFor) || Reads(s.Expect));
    }

    /// <summary>The watch at the start (home as it stands at the station's start), with the first edge booked.</summary>
    public StationWatch Start(ComponentContext context)
    {
        var open = _link.IsOpen(0.0);
        BookEdge(open, 0.0, context);
        return StationWatch.Start(open);
    }

    /// <summary>Home rose or set: the next edge is booked.</summary>
    public StationWatch OnEdge(StationWatch watch, StationViewEdge edge, ComponentContext context)
    {
        BookEdge(edge.InView, edge.StationTimeS, context);
        return watch.View(edge.InView, context.Now, _timeout);
    }

    public StationWatch OnCarrier(StationWatch watch, bool on, ComponentContext context) => watch.Carrier(on, context.Now, _timeout);

    /// <summary>The two points as they stand, stamped at <paramref name="at"/>.</summary>
    public static IReadOnlyList<TelemetrySample> Samples(StationWatch watch, SimTime at) =>
    [
        new(StationWatch.AlivePoint, at, new DiscreteValue(watch.Alive ? StationWatch.Yes : StationWatch.No)),
        new(StationWatch.InViewPoint, at, new DiscreteValue(watch.InView ? StationWatch.Yes : StationWatch.No)),
    ];

    /// <summary>
    /// Keeps the silence timer on the watch's <see cref="StationWatch.SilenceEnds"/>, and journals a change of what the
    /// ground knows; returns the points to give the rules and procedures when they changed, else null.
    /// </summary>
    public static IReadOnlyList<TelemetrySample>? Settle(StationWatch before, StationWatch after, EventHandle? timer, SimTime stamp, string cause, ComponentContext context, out EventHandle? nextTimer)
    {
        nextTimer = timer;
        if (before.SilenceEnds != after.SilenceEnds)
        {
            if (timer is { } pending) context.Cancel(pending);
            nextTimer = after.SilenceEnds is { } ends ? context.ScheduleSelf(ends - context.Now, StationSilenceOver.Instance, MissionPriority.Fault) : null;
        }

        if (before.Alive == after.Alive && before.InView == after.InView) return null;
        context.Record(GroundRecords.StationStatus, after.Alive ? Severity.Notice : Severity.Alarm,
            RecordField.Of("alive", after.Alive ? StationWatch.Yes : StationWatch.No),
            RecordField.Of("in_view", after.InView ? StationWatch.Yes : StationWatch.No),
            RecordField.Of("cause", cause),
            RecordField.Of("stamp_t_s", stamp.SecondsSinceEpoch));
        return Samples(after, stamp);
    }

    private void BookEdge(bool openNow, double fromS, ComponentContext context)
    {
        if (_link.Windows is null) return;
        var edgeS = openNow ? _link.ClosingS(fromS + PastEdgeS) : _link.NextOpeningS(fromS + PastEdgeS);
        if (double.IsInfinity(edgeS) || edgeS - fromS >= StationDesign.MaxTimerS) return;
        var at = StationTransmitter.CeilingTick(edgeS) + _light;
        context.ScheduleSelf(at > context.Now ? at - context.Now : SimDuration.Zero, new StationViewEdge(!openNow, edgeS), MissionPriority.Fault);
    }
}
