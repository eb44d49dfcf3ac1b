using System.Diagnostics;
using DescentOps.Engine.Components;
using DescentOps.Records;
using DescentOps.Mission.Messages;
using DescentOps.Primitives.Identity;
using DescentOps.Primitives.Time;
using DescentOps.Scenarios.Model;
using DescentOps.Records.Kinds;

namespace DescentOps.Mission.Faults;

/// <summary>
/// Starts and ends the scenario's faults on schedule. The fault acts inside the component it hits (the
/// probe loses heater power, the tether parts); the injector only tells it when, and logs it.
/// </summary>
public sealed class FaultInjectorComponent : SimComponent<FaultInjectorState>
{
    private readonly IReadOnlyList<FaultModel> _faults;
    private readonly LanderIds _ids;
    private readonly IReadOnlyList<ConditionTrigger> _conditions;

    public FaultInjectorComponent(Scenario scenario, LanderIds? ids = null)
        : base((ids ?? LanderIds.Single).FaultInjector, FailurePolicy.AbortRun)
    {
        _ids = ids ?? LanderIds.Single;
        _faults = scenario.Faults;
        _conditions = [.. FaultConditions.Compile(scenario).OrderBy(c => c.Key).Select(c => new ConditionTrigger(c.Key, c.Value))];
    }

    /// <summary>True when some fault waits for a condition, so the probe must send its true state here.</summary>
    public static bool WatchesTrueState(Scenario scenario) => scenario.Faults.Any(f => f.Start is FaultStart.OnCondition);

    public override FaultInjectorState InitialState => new(0, 0);

    /// <summary>The component a fault acts on; a vehicle loss strikes the vehicle it names.</summary>
    public static ComponentId TargetOf(FaultModel fault) => fault.Effect switch
    {
        FaultEffect.PowerDip or FaultEffect.HeaterSegmentFailure or FaultEffect.CloggedNozzle or FaultEffect.TiltKick => MissionIds.Probe,
        FaultEffect.SensorFault => MissionIds.Probe,
        FaultEffect.TetherBreak or FaultEffect.SpoolJam or FaultEffect.RelayFailure => MissionIds.Tether,
        FaultEffect.StationFailure or FaultEffect.StationUpset => MissionIds.Station,
        FaultEffect.VehicleLoss loss => MissionIds.Vehicle(loss.Vehicle),
        _ => throw new UnreachableException($"Fault effect {fault.Effect.GetType().Name} has no target."),
    };

    public override FaultInjectorState Handle(FaultInjectorState state, object message, ComponentContext context)
    {
        switch (message)
        {
            case RunStarted:
                for (var i = 0; i < _faults.Count; i++)
                {
                    switch (_faults[i].Start)
                    {
                        case FaultStart.AtTime time:
                            context.ScheduleSelf(SimDuration.FromSeconds(time.AtS), new FaultDue(i, false), MissionPriority.Fault);
                            break;
                        case FaultStart.AtDepth depth:
                            context.Schedule(_ids.Probe, SimDuration.Zero, new ArmDepthTrigger(i, depth.DepthM), MissionPriority.Fault);
                            break;
                        case FaultStart.AtRandom random:
                            ScheduleRandom(i, random, context);
                            break;
                        case FaultStart.OnCondition:
                            break; // watched through the true-state frames (_conditions)
                    }
                }

                return state;
            case TrueStateFrame truth:
                return WatchConditions(state, context, c => c.OnFrame(truth.Frame));
            case TriggerWake:
                return WatchConditions(state with { PendingWake = null }, context, c => c.OnWake(context.Now));
            case DepthTriggerReached reached:
                return Inject(state, reached.FaultIndex, context);
            case FaultDue { IsEnd: false } due:
                return Inject(state, due.Index, context);
            case FaultDue { IsEnd: true } due when state.ClearedByHand.Contains(due.Index):
                return state with { ClearedByHand = state.ClearedByHand.Remove(due.Index) };
            case FaultDue { IsEnd: true } due:
                return End(state, due.Index, context);
            case AddFault added:
                return Add(state, added.Fault, context);
            case ClearFault clear:
                return ClearByHand(state, clear.Name, context);
            default:
                throw new InvalidOperationException($"The fault injector cannot handle {message.GetType().Name}.");
        }
    }

    /// <summary>
    /// Draws every occurrence of a random fault at the start, from this component's own stream and in the faults'
    /// order, so a fault added at the end of the list (a branch) leaves the earlier faults' draws alone. Occurrence k+1
    /// begins an exponential interval after occurrence k ended, and never in the same instant.
    /// </summary>
    private void ScheduleRandom(int index, FaultStart.AtRandom random, ComponentContext context)
    {
        var fault = _faults[index];
        var rate = 1.0 / random.MeanIntervalS;
        var start = SimDuration.FromSeconds(random.NotBeforeS) + SimDuration.FromSeconds(context.Random.NextExponential(rate));
        var starts = new List<SimDuration> { start };
        for (var k = 1; k < random.Occurrences; k++)
        {
            var end = start + SimDuration.FromSeconds(fault.DurationS!.Value);
            var gap = SimDuration.FromSeconds(context.Random.NextExponential(rate));
            start = end + (gap > SimDuration.Zero ? gap : new SimDuration(1));
            starts.Add(start);
        }

        foreach (var at in starts) context.ScheduleSelf(at, new FaultDue(index, false), MissionPriority.Fault);
        context.Record(FaultRecords.Drawn, Severity.Info,
            RecordField.Of("fault", fault.Name),
            RecordField.Of("mean_interval_s", random.MeanIntervalS),
            RecordField.Of("starts_s", string.Join(" ", starts.Select(t => t.TotalSeconds.ToString("R", System.Globalization.CultureInfo.InvariantCulture)))));
    }

    /// <summary>Feeds the trigger conditions, injects the faults whose condition now holds, and keeps one wake-up timer.</summary>
    private FaultInjectorState WatchConditions(FaultInjectorState state, ComponentContext context, Func<ConditionTrigger, Rules.Evaluation.RuleFiring?> step)
    {
        foreach (var condition in _conditions)
        {
            if (step(condition) is not { } firing) continue;
            context.Record(FaultRecords.Triggered, Severity.Warning,
                RecordField.Of("fault", _faults[condition.FaultIndex].Name),
                RecordField.Of("condition", _faults[condition.FaultIndex].Start is FaultStart.OnCondition on ? on.When : ""),
                RecordField.Of("evidence", string.Join("; ", firing.Evidence.Select(e => string.Create(System.Globalization.CultureInfo.InvariantCulture, $"{e.Point}={e.Value}@{e.Time.SecondsSinceEpoch:R}s")))));
            state = Inject(state, condition.FaultIndex, context);
        }

        if (state.PendingWake is { } pending) context.Cancel(pending);
        var due = _conditions.Select(c => c.NextDueTime).Where(t => t is not null && t.Value > context.Now).Min();
        return state with { PendingWake = due is { } at ? context.ScheduleSelf(at - context.Now, TriggerWake.Instance, MissionPriority.Fault) : null };
    }

    private FaultModel FaultAt(FaultInjectorState state, int index) => index < _faults.Count ? _faults[index] : state.Added[index - _faults.Count];

    private FaultInjectorState End(FaultInjectorState state, int index, ComponentContext context)
    {
        var ended = FaultAt(state, index);
        context.Record(FaultRecords.Cleared, Severity.Notice, RecordField.Of("fault", ended.Name));
        context.Schedule(_ids.Of(TargetOf(ended)), SimDuration.Zero, new FaultCleared(ended), MissionPriority.Fault);
        return state with { Cleared = state.Cleared + 1, Active = state.Active.Remove(index) };
    }

    /// <summary>A fault from the console: at its time (in the future), at its depth, or now.</summary>
    private FaultInjectorState Add(FaultInjectorState state, FaultModel fault, ComponentContext context)
    {
        var index = _faults.Count + state.Added.Count;
        state = state with { Added = state.Added.Add(fault) };
        if (fault.Start is FaultStart.AtTime { AtS: var at } && at > context.Now.SecondsSinceEpoch)
        {
            context.ScheduleSelf(SimTime.FromSecondsSinceEpoch(at) - context.Now, new FaultDue(index, false), MissionPriority.Fault);
            return state;
        }

        if (fault.Start is FaultStart.AtDepth { DepthM: var depth })
        {
            context.Schedule(_ids.Probe, SimDuration.Zero, new ArmDepthTrigger(index, depth), MissionPriority.Fault);
            return state;
        }

        return Inject(state, index, context);
    }

    private FaultInjectorState ClearByHand(FaultInjectorState state, string name, ComponentContext context)
    {
        var active = state.Active.Where(i => FaultAt(state, i).Name == name).Order().ToList();
        if (active.Count == 0)
        {
            context.Record("fault.clear_ignored", Severity.Info, RecordField.Of("fault", name), RecordField.Of("reason", "not active"));
            return state;
        }

        foreach (var index in active)
        {
            state = End(state, index, context);
            if (FaultAt(state, index).DurationS is not null) state = state with { ClearedByHand = state.ClearedByHand.Add(index) };
        }

        return state;
    }

    private FaultInjectorState Inject(FaultInjectorState state, int index, ComponentContext context)
    {
        var fault = FaultAt(state, index);
        context.Record("fault.injected", Severity.Alarm,
            RecordField.Of("fault", fault.Name),
            RecordField.Of("kind", fault.Kind.ToString()),
            RecordField.Of("target", _ids.Of(TargetOf(fault)).Name),
            RecordField.Of("point", fault.Effect is FaultEffect.SensorFault sensor ? sensor.Point : ""),
            RecordField.Of("relay", fault.Effect is FaultEffect.RelayFailure relay ? $"relay-{relay.RelayNumber}" : ""),
            RecordField.Of("duration_s", fault.DurationS ?? double.PositiveInfinity));
        context.Schedule(_ids.Of(TargetOf(fault)), SimDuration.Zero, new FaultStarted(fault), MissionPriority.Fault);
        if (fault.DurationS is { } duration)
        {
            context.ScheduleSelf(SimDuration.FromSeconds(duration), new FaultDue(index, true), MissionPriority.Fault);
        }

        return state with { Started = state.Started + 1, Active = state.Active.Add(index) };
    }
}
