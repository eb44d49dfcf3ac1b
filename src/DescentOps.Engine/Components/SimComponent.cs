using DescentOps.Primitives.Identity;

namespace DescentOps.Engine.Components;

/// <summary>
/// Base class of every simulated component. <typeparamref name="TState"/> should be an immutable record:
/// a handler returns a new state (with a <c>with</c> expression) instead of changing the old one, which is
/// what lets a failed handling be rolled back exactly.
/// </summary>
public abstract class SimComponent<TState> : ISimComponent
    where TState : notnull
{
    protected SimComponent(ComponentId id, FailurePolicy failurePolicy = FailurePolicy.AbortRun, int maxRestarts = 3)
    {
        Id = id;
        FailurePolicy = failurePolicy;
        MaxRestarts = maxRestarts;
    }

    public ComponentId Id { get; }

    public FailurePolicy FailurePolicy { get; }

    public int MaxRestarts { get; }

    public abstract TState InitialState { get; }

    object ISimComponent.InitialState => InitialState;

    object ISimComponent.Handle(object state, object message, ComponentContext context) =>
        Handle((TState)state, message, context);

    /// <summary>
    /// Handles one delivered message. <see cref="RunStarted"/> arrives first, at the epoch, to every component.
    /// Unknown messages should be refused with an exception: a silently ignored message is a lost event.
    /// </summary>
    public abstract TState Handle(TState state, object message, ComponentContext context);
}
