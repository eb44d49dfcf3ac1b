using DescentOps.Engine.Components;
using DescentOps.Records;
using DescentOps.Primitives.Identity;
using DescentOps.Primitives.Time;

namespace DescentOps.Engine.Tests.Models;

/// <summary>Schedules a timer and thinks better of it within the same handling.</summary>
public sealed class SelfCancellingTimer(ComponentId id) : SimComponent<int>(id)
{
    public override int InitialState => 0;

    public override int Handle(int state, object message, ComponentContext context)
    {
        switch (message)
        {
            case RunStarted:
                var regretted = context.ScheduleSelf(SimDuration.FromSeconds(1), "regretted");
                context.Cancel(regretted);
                context.ScheduleSelf(SimDuration.FromSeconds(2), "kept");
                return state;
            case string name:
                context.Record("timer.fired", Severity.Info, RecordField.Of("name", name));
                return state;
            default:
                throw new InvalidOperationException($"timer got {message}");
        }
    }
}
