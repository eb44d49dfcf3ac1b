using DescentOps.Engine.Components;
using DescentOps.Engine.Scheduling;
using DescentOps.Primitives.Identity;

namespace DescentOps.Engine.Tests.Models;

/// <summary>Tries to cancel whatever handle it is sent, its own or not.</summary>
public sealed class Meddler(ComponentId id)
    : SimComponent<int>(id, FailurePolicy.RestartFromLastState, maxRestarts: 3)
{
    public override int InitialState => 0;

    public override int Handle(int state, object message, ComponentContext context)
    {
        if (message is CancelThis cancel) context.Cancel(cancel.Handle);
        return state;
    }

    public sealed record CancelThis(EventHandle Handle);
}
