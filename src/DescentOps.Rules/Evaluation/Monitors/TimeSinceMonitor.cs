using DescentOps.Primitives.Time;
using DescentOps.Rules.Syntax;

namespace DescentOps.Rules.Evaluation.Monitors;

/// <summary>
/// Time since an event: the event is the operand beginning to hold (a false-to-true change, or its first verdict
/// being true). 'above D' holds once more than D has passed since the latest start; 'below D' while less has. Either
/// can change between samples, at the latest start plus D, which is why this node asks for a wake-up.
/// </summary>
internal sealed class TimeSinceMonitor(ConditionMonitor operand, Comparison comparison, SimDuration duration) : ConditionMonitor
{
    private static readonly SimDuration Tick = new(1);
    private bool _held;
    private SimTime? _lastStart;
    private IReadOnlyList<TelemetrySample> _evidence = [];

    public override MonitorResult Evaluate(EvaluationContext context)
    {
        var result = operand.Evaluate(context);
        if (result.Holds && !_held)
        {
            _lastStart = context.Now;
            _evidence = result.Evidence;
        }

        _held = result.Holds;
        if (_lastStart is not { } start) return new MonitorResult(false, result.Evidence);
        var elapsed = context.Now - start;
        var holds = comparison == Comparison.Above ? elapsed > duration : elapsed < duration;
        return new MonitorResult(holds, _evidence);
    }

    public override void Reset()
    {
        _held = false;
        _lastStart = null;
        _evidence = [];
        operand.Reset();
    }

    /// <summary>'above' turns true one tick after start + D (strictly more); 'below' turns false at start + D.</summary>
    public override SimTime? NextWakeUp()
    {
        var inner = operand.NextWakeUp();
        if (_lastStart is not { } start) return inner;
        var due = comparison == Comparison.Above ? start + duration + Tick : start + duration;
        return inner is { } other && other < due ? other : due;
    }
}
