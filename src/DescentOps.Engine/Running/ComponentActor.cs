using Akka.Actor;
using DescentOps.Engine.Scheduling;
using DescentOps.Primitives.Time;

namespace DescentOps.Engine.Running;

/// <summary>Hosts one component: handles the batch the coordinator sends and acknowledges it with the results.</summary>
internal sealed class ComponentActor : UntypedActor
{
    private readonly ComponentHost _host;

    public ComponentActor(ComponentHost host) => _host = host;

    protected override void OnReceive(object message)
    {
        if (message is DeliverBatch batch)
        {
            Sender.Tell(new BatchHandled(batch.Round, _host.HandleBatch(batch.Now, batch.Events)));
        }
        else
        {
            Unhandled(message);
        }
    }

    internal sealed record DeliverBatch(long Round, SimTime Now, IReadOnlyList<SimEvent> Events);

    internal sealed record BatchHandled(long Round, EventResult[] Results);
}
