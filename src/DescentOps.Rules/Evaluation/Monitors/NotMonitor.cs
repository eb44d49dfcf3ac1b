using DescentOps.Primitives.Time;

namespace DescentOps.Rules.Evaluation.Monitors;

/// <summary>
/// Negation. With no data at all the operand is false, and so its negation would hold; a rule must not fire on
/// silence, so "not" of a condition that has seen no sample does not hold either.
/// </summary>
internal sealed class NotMonitor(ConditionMonitor operand) : ConditionMonitor
{
    public override MonitorResult Evaluate(EvaluationContext context)
    {
        var result = operand.Evaluate(context);
        return new MonitorResult(!result.Holds && result.Evidence.Count > 0, result.Evidence);
    }

    public override void Reset() => operand.Reset();

    public override SimTime? NextWakeUp() => operand.NextWakeUp();
}
