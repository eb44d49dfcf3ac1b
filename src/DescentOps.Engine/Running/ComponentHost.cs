using DescentOps.Primitives.Failures;
using DescentOps.Engine.Components;
using DescentOps.Engine.Randomness;
using DescentOps.Engine.Scheduling;
using DescentOps.Primitives.Time;

namespace DescentOps.Engine.Running;

/// <summary>
/// Holds one component's committed state and runs its handler for a batch of events. Pure and
/// single-threaded: the sequential kernel calls it directly and the actor kernel wraps it in an actor.
/// </summary>
internal sealed class ComponentHost
{
    private readonly ISimComponent _component;
    private readonly ComponentContext _context;
    private object _state;
    private int _failures;

    public ComponentHost(ISimComponent component, long seed)
    {
        _component = component;
        _state = component.InitialState;
        _context = new ComponentContext(component.Id, new RandomStream(seed, component.Id));
    }

    public EventResult[] HandleBatch(SimTime now, IReadOnlyList<SimEvent> events)
    {
        var results = new EventResult[events.Count];
        for (var i = 0; i < events.Count; i++)
        {
            results[i] = HandleOne(now, events[i]);
        }

        return results;
    }

    private EventResult HandleOne(SimTime now, SimEvent simEvent)
    {
        _context.Begin(now);
        var mark = _context.SequenceMark;
        try
        {
            _state = _component.Handle(_state, simEvent.Payload, _context);
            return new EventResult(
                simEvent.Key,
                [.. _context.Scheduled],
                [.. _context.Cancelled],
                [.. _context.Records],
                _context.StopRequest,
                null);
        }
#pragma warning disable CA1031 // Any exception from a component is a simulated failure to log and decide on, by design.
        catch (Exception exception)
#pragma warning restore CA1031
        {
            _context.RollBackSequence(mark);
            _failures++;
            // A failure that a restart cannot cure (a model asked outside its range) ends the run at once.
            var restart = _component.FailurePolicy == FailurePolicy.RestartFromLastState && _failures <= _component.MaxRestarts && exception is not IAbortsRun;
            var failure = new ComponentFailure(exception.GetType().Name, exception.Message, restart, _failures);
            return new EventResult(simEvent.Key, [], [], [], null, failure);
        }
    }
}
