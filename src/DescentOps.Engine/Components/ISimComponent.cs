using DescentOps.Primitives.Identity;

namespace DescentOps.Engine.Components;

/// <summary>
/// A simulated component as the kernel sees it: an id, a failure policy and a pure transition from
/// (state, message) to the next state. State lives outside the component so the kernel can keep the last
/// committed state and return to it when a handler throws. Implement <see cref="SimComponent{TState}"/>.
/// </summary>
public interface ISimComponent
{
    ComponentId Id { get; }

    FailurePolicy FailurePolicy { get; }

    /// <summary>Restarts allowed before a failing component aborts the run anyway.</summary>
    int MaxRestarts { get; }

    object InitialState { get; }

    object Handle(object state, object message, ComponentContext context);
}
