using DescentOps.Primitives.Time;

namespace DescentOps.Rules.Evaluation.Monitors;

/// <summary>
/// Persistence by duration. Values hold between samples, so the operand has held since the first evaluation
/// that found it true; the period can end between samples, which is why this node asks for a wake-up.
/// </summary>
internal sealed class HoldsForDurationMonitor(ConditionMonitor operand, SimDuration duration) : ConditionMonitor
{
    private SimTime? _trueSince;
    private IReadOnlyList<TelemetrySample> _evidence = [];

    public override MonitorResult Evaluate(EvaluationContext context)
    {
        var result = operand.Evaluate(context);
        if (!result.Holds)
        {
            _trueSince = null;
            _evidence = [];
            return result;
        }

        if (_trueSince is null)
        {
            _trueSince = context.Now;
            _evidence = result.Evidence;
        }
        else
        {
            _evidence = EvidenceSet.Union([_evidence, result.Evidence]);
        }

        return new MonitorResult(context.Now - _trueSince.Value >= duration, _evidence);
    }

    public override void Reset()
    {
        _trueSince = null;
        _evidence = [];
        operand.Reset();
    }

    public override SimTime? NextWakeUp()
    {
        var inner = operand.NextWakeUp();
        if (_trueSince is not { } since)
        {
            return inner;
        }

        var due = since + duration;
        return inner is { } other && other < due ? other : due;
    }
}
