using DescentOps.Engine.Components;
using DescentOps.Records;
using DescentOps.Engine.Scheduling;
using DescentOps.Primitives.Identity;
using DescentOps.Primitives.Time;

namespace DescentOps.Engine.Tests.Models;

/// <summary>
/// A node of a fully connected mesh that passes tokens to random peers with delays of 0, 0 or 1 ms and one
/// of three priorities, so that most instants hold many tied events and zero-delay chains. Each node also
/// re-arms a timer on every token, cancelling the old one, so cancellation is part of the order under test.
/// The busy loop scales with <c>workFactor</c>: uneven handler cost makes the actors finish in a different
/// order on every run, which the journal must not show.
/// </summary>
public sealed class MeshNode(ComponentId id, IReadOnlyList<ComponentId> peers, int workFactor, int tokens, int hops)
    : SimComponent<MeshNode.State>(id)
{
    private static readonly EventPriority[] Priorities = [EventPriority.First, EventPriority.Normal, EventPriority.Last];

    public override State InitialState => new(0, 1, null);

    public override State Handle(State state, object message, ComponentContext context)
    {
        switch (message)
        {
            case RunStarted:
                for (var lineage = 0; lineage < tokens; lineage++) Pass(new Token(hops, lineage), context);
                return state;
            case Token token:
                var work = Burn(state.Work, workFactor * 2_000);
                context.Record(
                    "mesh.token",
                    Severity.Debug,
                    RecordField.Of("lineage", token.Lineage),
                    RecordField.Of("hops", token.Hops),
                    RecordField.Of("handled", state.Handled),
                    RecordField.Of("work", unchecked((long)work)));
                if (token.Hops > 0) Pass(token with { Hops = token.Hops - 1 }, context);
                if (state.Timer is { } old) context.Cancel(old);
                var timer = context.ScheduleSelf(SimDuration.FromSeconds(0.0015), Quiet.Instance);
                return new State(state.Handled + 1, work, timer);
            case Quiet:
                context.Record("mesh.quiet", Severity.Debug, RecordField.Of("handled", state.Handled));
                return state with { Timer = null };
            default:
                throw new InvalidOperationException($"mesh node got {message}");
        }
    }

    private void Pass(Token token, ComponentContext context)
    {
        var target = peers[context.Random.NextInt(0, peers.Count)];
        var delay = SimDuration.FromSeconds(context.Random.NextInt(0, 3) == 2 ? 0.001 : 0);
        context.Schedule(target, delay, token, Priorities[context.Random.NextInt(0, Priorities.Length)]);
    }

    /// <summary>A linear congruential walk (Knuth's MMIX constants): deterministic work the JIT cannot drop.</summary>
    private static ulong Burn(ulong x, int steps)
    {
        for (var i = 0; i < steps; i++) x = unchecked((x * 6364136223846793005UL) + 1442695040888963407UL);
        return x;
    }

    public sealed record State(long Handled, ulong Work, EventHandle? Timer);

    public sealed record Token(int Hops, int Lineage);

    public sealed record Quiet
    {
        public static Quiet Instance { get; } = new();
    }
}
