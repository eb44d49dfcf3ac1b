using DescentOps.Rules.Compiled;

namespace DescentOps.Rules.Evaluation.Monitors;

/// <summary>Difference check: the left point's latest sample less the right point's latest sample, whenever each was taken.</summary>
internal sealed class DifferenceMonitor(DifferenceCondition condition) : ConditionMonitor
{
    public override MonitorResult Evaluate(EvaluationContext context)
    {
        var left = context.History.Of(condition.Left);
        var right = context.History.Of(condition.Right);
        if (left.Count == 0 || right.Count == 0 || left[^1].Value is not NumericValue a || right[^1].Value is not NumericValue b)
        {
            return MonitorResult.NoData;
        }

        var difference = a.ValueSi - b.ValueSi;
        return new MonitorResult(double.IsFinite(difference) && condition.Threshold.Holds(difference), [left[^1], right[^1]]);
    }
}
