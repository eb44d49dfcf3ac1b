using DescentOps.Engine.Components;
using DescentOps.Records;
using DescentOps.Engine.Scheduling;
using DescentOps.Primitives.Identity;
using DescentOps.Primitives.Time;

namespace DescentOps.Engine.Tests.Models;

/// <summary>
/// Arms a timeout at the start and cancels it on Disarm. It can show its timer's handle to another
/// component, which lets a test try to cancel an event that is not that component's own.
/// </summary>
public sealed class Watchdog(ComponentId id, SimDuration timeout, ComponentId? showHandleTo = null)
    : SimComponent<Watchdog.State>(id)
{
    public override State InitialState => new(null);

    public override State Handle(State state, object message, ComponentContext context)
    {
        switch (message)
        {
            case RunStarted:
                var timer = context.ScheduleSelf(timeout, Timeout.Instance);
                if (showHandleTo is { } other) context.Schedule(other, SimDuration.FromSeconds(1), new Meddler.CancelThis(timer));
                return new State(timer);
            case Disarm:
                if (state.Timer is { } armed) context.Cancel(armed);
                context.Record("watchdog.disarmed", Severity.Info);
                return new State(null);
            case Timeout:
                context.Record("watchdog.fired", Severity.Warning);
                return new State(null);
            default:
                throw new InvalidOperationException($"watchdog got {message}");
        }
    }

    public sealed record State(EventHandle? Timer);

    public sealed record Disarm
    {
        public static Disarm Instance { get; } = new();
    }

    public sealed record Timeout
    {
        public static Timeout Instance { get; } = new();
    }
}
