using DescentOps.Engine.Components;
using DescentOps.Engine.Journaling;
using DescentOps.Mission.Messages;
using DescentOps.Primitives.Identity;
using DescentOps.Primitives.Time;
using DescentOps.Scenarios.Model;

namespace DescentOps.Mission.Faults;

/// <summary>
/// Starts and ends the scenario's faults on schedule. The fault acts inside the component it hits (the
/// probe loses heater power, the tether parts); the injector only tells it when, and logs it.
/// </summary>
public sealed class FaultInjectorComponent : SimComponent<FaultInjectorState>
{
    private readonly IReadOnlyList<FaultModel> _faults;

    public FaultInjectorComponent(Scenario scenario)
        : base(MissionIds.FaultInjector, FailurePolicy.AbortRun)
    {
        _faults = scenario.Faults;
    }

    public override FaultInjectorState InitialState => new(0, 0);

    public static ComponentId TargetOf(FaultKind kind) => kind switch
    {
        FaultKind.PowerDip => MissionIds.Probe,
        FaultKind.TetherBreak or FaultKind.SpoolJam or FaultKind.RelayFailure => MissionIds.Tether,
        FaultKind.StationFailure => MissionIds.Station,
        FaultKind.SensorStuck or FaultKind.SensorBias or FaultKind.SensorDropout => MissionIds.Probe,
        FaultKind.HeaterSegmentFailure or FaultKind.TiltKick => MissionIds.Probe,
        _ => throw new ArgumentOutOfRangeException(nameof(kind), kind, null),
    };

    public override FaultInjectorState Handle(FaultInjectorState state, object message, ComponentContext context)
    {
        switch (message)
        {
            case RunStarted:
                for (var i = 0; i < _faults.Count; i++)
                {
                    if (_faults[i].AtS is { } at)
                    {
                        context.ScheduleSelf(SimDuration.FromSeconds(at), new FaultDue(i, false), MissionPriority.Fault);
                    }
                    else
                    {
                        context.Schedule(MissionIds.Probe, SimDuration.Zero, new ArmDepthTrigger(i, _faults[i].AtDepthM!.Value), MissionPriority.Fault);
                    }
                }

                return state;
            case DepthTriggerReached reached:
                return Inject(state, reached.FaultIndex, context);
            case FaultDue { IsEnd: false } due:
                return Inject(state, due.Index, context);
            case FaultDue { IsEnd: true } due:
                var ended = _faults[due.Index];
                context.Record("fault.cleared", Severity.Notice, RecordField.Of("fault", ended.Name));
                context.Schedule(TargetOf(ended.Kind), SimDuration.Zero, new FaultCleared(ended), MissionPriority.Fault);
                return state with { Cleared = state.Cleared + 1 };
            default:
                throw new InvalidOperationException($"The fault injector cannot handle {message.GetType().Name}.");
        }
    }

    private FaultInjectorState Inject(FaultInjectorState state, int index, ComponentContext context)
    {
        var fault = _faults[index];
        context.Record("fault.injected", Severity.Alarm,
            RecordField.Of("fault", fault.Name),
            RecordField.Of("kind", fault.Kind.ToString()),
            RecordField.Of("target", TargetOf(fault.Kind).Name),
            RecordField.Of("point", fault.Point ?? ""),
            RecordField.Of("relay", fault.RelayNumber is { } relay ? $"relay-{relay}" : ""),
            RecordField.Of("duration_s", fault.DurationS ?? double.PositiveInfinity));
        context.Schedule(TargetOf(fault.Kind), SimDuration.Zero, new FaultStarted(fault), MissionPriority.Fault);
        if (fault.DurationS is { } duration)
        {
            context.ScheduleSelf(SimDuration.FromSeconds(duration), new FaultDue(index, true), MissionPriority.Fault);
        }

        return state with { Started = state.Started + 1 };
    }
}
