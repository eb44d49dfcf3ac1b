using DescentOps.Rules.Compiled;

namespace DescentOps.Rules.Evaluation.Monitors;

/// <summary>Limit check on the latest sample.</summary>
internal sealed class LimitMonitor(LimitCondition condition) : ConditionMonitor
{
    public override MonitorResult Evaluate(EvaluationContext context)
    {
        var samples = context.History.Of(condition.Point);
        if (samples.Count == 0 || samples[^1].Value is not NumericValue value)
        {
            return MonitorResult.NoData;
        }

        return new MonitorResult(condition.Threshold.Holds(value.ValueSi), [samples[^1]]);
    }
}
