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

    /// <summary>
    /// The evidence is the samples that started the period and those that hold now. Merging every sample of a long
    /// period on every evaluation made a rule that holds for months cost more than the rest of a run (rules benchmark).
    /// </summary>
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

        var held = context.Now - _trueSince.Value >= duration;
        return new MonitorResult(held, held ? EvidenceSet.Union([_evidence, result.Evidence]) : result.Evidence);
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
