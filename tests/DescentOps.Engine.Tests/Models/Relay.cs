using DescentOps.Engine.Components;
using DescentOps.Records;
using DescentOps.Primitives.Identity;
using DescentOps.Primitives.Time;

namespace DescentOps.Engine.Tests.Models;

/// <summary>One link of a ring that passes a numbered hop on to the next link with zero delay, up to a limit.</summary>
public sealed class Relay(ComponentId id, ComponentId next, int lastHop) : SimComponent<int>(id)
{
    public override int InitialState => 0;

    public override int Handle(int state, object message, ComponentContext context)
    {
        switch (message)
        {
            case RunStarted:
                return state;
            case Hop hop:
                context.Record("relay.hop", Severity.Debug, RecordField.Of("n", hop.Number));
                if (hop.Number < lastHop) context.Schedule(next, SimDuration.Zero, new Hop(hop.Number + 1));
                return state + 1;
            default:
                throw new InvalidOperationException($"relay got {message}");
        }
    }

    public sealed record Hop(int Number);
}
