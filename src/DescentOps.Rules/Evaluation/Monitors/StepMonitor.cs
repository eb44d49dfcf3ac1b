using DescentOps.Rules.Compiled;

namespace DescentOps.Rules.Evaluation.Monitors;

/// <summary>Delta check: newest minus previous sample.</summary>
internal sealed class StepMonitor(StepCondition condition) : ConditionMonitor
{
    public override MonitorResult Evaluate(EvaluationContext context)
    {
        var samples = context.History.Of(condition.Point);
        if (samples.Count < 2 || samples[^1].Value is not NumericValue newest || samples[^2].Value is not NumericValue previous)
        {
            return MonitorResult.NoData;
        }

        var step = newest.ValueSi - previous.ValueSi;
        return new MonitorResult(double.IsFinite(step) && condition.Threshold.Holds(step), [samples[^2], samples[^1]]);
    }
}
