using DescentOps.Primitives.Time;

namespace DescentOps.Rules.Evaluation.Monitors;

/// <summary>A latch: once the operand has held it holds, with the evidence of that first instant, until reset.</summary>
internal sealed class LatchedMonitor(ConditionMonitor operand) : ConditionMonitor
{
    private IReadOnlyList<TelemetrySample>? _evidence;

    public override MonitorResult Evaluate(EvaluationContext context)
    {
        var result = operand.Evaluate(context);
        if (_evidence is null && result.Holds) _evidence = result.Evidence;
        return _evidence is null ? new MonitorResult(false, result.Evidence) : new MonitorResult(true, _evidence);
    }

    public override void Reset()
    {
        _evidence = null;
        operand.Reset();
    }

    public override SimTime? NextWakeUp() => _evidence is null ? operand.NextWakeUp() : null;
}
