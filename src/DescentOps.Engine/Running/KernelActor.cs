using Akka.Actor;
using DescentOps.Primitives.Identity;

namespace DescentOps.Engine.Running;

/// <summary>
/// The coordinator: a thin shell around <see cref="KernelCore"/> that sends each instant's events to the
/// component actors and collects their acknowledgements. A component actor that dies outside its handler
/// (which the host's own catch should make impossible) ends the run as a kernel fault instead of a hang.
/// </summary>
/// <remarks>
/// An instant whose events all go to one component has nothing to run in parallel; sending it to that
/// component's actor would only cost two thread hand-offs. Such a round is handled here, on the
/// coordinator's thread, through the same <see cref="ComponentHost"/> the actor holds: the barrier already
/// guarantees the actor is idle, and the message hand-offs before and after order the memory accesses.
/// After <see cref="InlineRoundsBeforeYield"/> such rounds in a row the next one goes through its actor, which
/// lets the coordinator's mailbox (a Terminated, say) be read.
/// </remarks>
internal sealed class KernelActor : UntypedActor
{
    private readonly KernelSetup _setup;
    private readonly TaskCompletionSource<RunResult> _completion;
    private const int InlineRoundsBeforeYield = 1024;

    private readonly Dictionary<ComponentId, IActorRef> _actors = [];
    private readonly Dictionary<ComponentId, ComponentHost> _hosts = [];
    private readonly List<EventResult[]> _inline = [null!];
    private readonly List<EventResult[]> _acks = [];
    private KernelCore? _core;
    private long _round;
    private int _awaiting;

    public KernelActor(KernelSetup setup, TaskCompletionSource<RunResult> completion)
    {
        _setup = setup;
        _completion = completion;
    }

    protected override SupervisorStrategy SupervisorStrategy() =>
        new OneForOneStrategy(_ => Directive.Stop);

    protected override void PreStart()
    {
        try
        {
            _core = new KernelCore(_setup);
            var index = 0;
            foreach (var component in _setup.Components)
            {
                var host = new ComponentHost(component, _setup.Seed);
                // Numbered, not named after the id: an id may hold any non-blank character, an actor name only a few ASCII ones.
                var actor = Context.ActorOf(Props.Create(() => new ComponentActor(host)), "c" + index++);
                Context.Watch(actor);
                _actors.Add(component.Id, actor);
                _hosts.Add(component.Id, host);
            }
        }
#pragma warning disable CA1031 // Report every setup failure through the task instead of a dead actor.
        catch (Exception exception)
#pragma warning restore CA1031
        {
            _completion.TrySetException(exception);
            Context.Stop(Self);
            return;
        }

        Self.Tell(NextRound.Instance);
    }

    protected override void OnReceive(object message)
    {
        switch (message)
        {
            case NextRound:
                BeginRound();
                break;
            case ComponentActor.BatchHandled handled when handled.Round == _round:
                _acks.Add(handled.Results);
                if (--_awaiting == 0) Commit();
                break;
            case Terminated terminated when _completion.Task.IsCompleted is false:
                _core!.Abort(RunOutcomeKind.KernelFault, $"the actor of {_actors.First(a => a.Value.Equals(terminated.ActorRef)).Key} stopped outside its handler");
                Complete();
                break;
            default:
                Unhandled(message);
                break;
        }
    }

    private void BeginRound()
    {
        try
        {
            for (var inline = 0; ; inline++)
            {
                if (!_core!.TryBeginRound(out var batches))
                {
                    Complete();
                    return;
                }

                if (batches.Count == 1 && inline < InlineRoundsBeforeYield)
                {
                    var (target, events) = batches[0];
                    _inline[0] = _hosts[target].HandleBatch(_core.Now, events);
                    _core.CommitRound(_inline);
                    continue;
                }

                _round++;
                _acks.Clear();
                _awaiting = batches.Count;
                foreach (var (target, events) in batches)
                {
                    _actors[target].Tell(new ComponentActor.DeliverBatch(_round, _core.Now, events));
                }

                return;
            }
        }
#pragma warning disable CA1031
        catch (Exception exception)
#pragma warning restore CA1031
        {
            Fail(exception);
        }
    }

    private void Commit()
    {
        try
        {
            _core!.CommitRound(_acks);
        }
#pragma warning disable CA1031 // A journal that cannot be written ends the run; the caller sees the exception.
        catch (Exception exception)
#pragma warning restore CA1031
        {
            Fail(exception);
            return;
        }

        // Straight on, not through a message to itself: a self-message costs a mailbox round trip per
        // instant, a third of the messages when instants hold one event. Messages that arrived meanwhile
        // (a Terminated) still wait only for this handler, which returns as soon as the batches are sent.
        BeginRound();
    }

    private void Complete()
    {
        _completion.TrySetResult(_core!.Result());
        Context.Stop(Self);
    }

    private void Fail(Exception exception)
    {
        _completion.TrySetException(exception);
        Context.Stop(Self);
    }

    private sealed record NextRound
    {
        public static NextRound Instance { get; } = new();
    }
}
