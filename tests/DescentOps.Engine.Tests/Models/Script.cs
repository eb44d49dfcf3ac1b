using DescentOps.Engine.Components;
using DescentOps.Primitives.Identity;
using DescentOps.Primitives.Time;

namespace DescentOps.Engine.Tests.Models;

/// <summary>A test's stimulus: sends a fixed list of messages at fixed delays after the epoch, then idles.</summary>
public sealed class Script : SimComponent<int>
{
    private readonly IReadOnlyList<(SimDuration At, ComponentId Target, object Payload)> _lines;

    public Script(ComponentId id, params (SimDuration At, ComponentId Target, object Payload)[] lines)
        : base(id) => _lines = lines;

    public override int InitialState => 0;

    public override int Handle(int state, object message, ComponentContext context)
    {
        if (message is not RunStarted) throw new InvalidOperationException($"script got {message}");
        foreach (var (at, target, payload) in _lines) context.Schedule(target, at, payload);
        return state;
    }
}
