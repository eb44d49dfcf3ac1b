using DescentOps.Engine.Components;
using DescentOps.Records;
using DescentOps.Engine.Running;
using DescentOps.Primitives.Identity;
using DescentOps.Primitives.Time;

namespace DescentOps.Engine.Tests.Models;

/// <summary>Ticks at the epoch and every period after; optionally declares the run complete at one tick.</summary>
public sealed class Ticker(ComponentId id, SimDuration period, int? stopAtTick = null) : SimComponent<int>(id)
{
    public override int InitialState => 0;

    public override int Handle(int state, object message, ComponentContext context)
    {
        if (message is not (RunStarted or Tick)) throw new InvalidOperationException($"ticker got {message}");
        context.Record("ticker.tick", Severity.Debug, RecordField.Of("n", state));
        if (state == stopAtTick) context.StopRun(RunOutcomeKind.Completed, $"tick {state} reached");
        context.ScheduleSelf(period, Tick.Instance);
        return state + 1;
    }

    public sealed record Tick
    {
        public static Tick Instance { get; } = new();
    }
}
