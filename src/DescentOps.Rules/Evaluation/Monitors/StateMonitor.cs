using DescentOps.Rules.Compiled;

namespace DescentOps.Rules.Evaluation.Monitors;

/// <summary>Expected-state check on the latest sample; with no sample yet, neither "is" nor "is not" holds.</summary>
internal sealed class StateMonitor(StateCondition condition) : ConditionMonitor
{
    public override MonitorResult Evaluate(EvaluationContext context)
    {
        var samples = context.History.Of(condition.Point);
        if (samples.Count == 0 || samples[^1].Value is not DiscreteValue value)
        {
            return MonitorResult.NoData;
        }

        var equal = string.Equals(value.State, condition.Value, StringComparison.Ordinal);
        return new MonitorResult(equal != condition.Negated, [samples[^1]]);
    }
}
