using DescentOps.Engine.Components;
using DescentOps.Records;
using DescentOps.Primitives.Identity;
using DescentOps.Primitives.Time;

namespace DescentOps.Engine.Tests.Models;

/// <summary>
/// Counts bumps and echoes each new value back to itself a second later. A bump marked to fail first does
/// all its work (new state, a record, an echo) and then throws, so anything of it that survives shows.
/// </summary>
public sealed class FlakyCounter(ComponentId id, FailurePolicy policy, int maxRestarts)
    : SimComponent<FlakyCounter.State>(id, policy, maxRestarts)
{
    public override State InitialState => new(0);

    public override State Handle(State state, object message, ComponentContext context)
    {
        switch (message)
        {
            case RunStarted:
                return state;
            case Bump bump:
                var next = state with { Value = state.Value + 1 };
                context.Record("counter.value", Severity.Info, RecordField.Of("value", next.Value));
                context.ScheduleSelf(SimDuration.FromSeconds(1), new Echo(next.Value));
                if (bump.Fail) throw new InvalidOperationException($"injected fault at value {next.Value}");
                return next;
            case Echo echo:
                context.Record("counter.echo", Severity.Info, RecordField.Of("value", echo.Value));
                return state;
            default:
                throw new InvalidOperationException($"counter got {message}");
        }
    }

    public sealed record State(int Value);

    public sealed record Bump(bool Fail);

    public sealed record Echo(int Value);
}
