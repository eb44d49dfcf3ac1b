using DescentOps.Rules.Compiled;

namespace DescentOps.Rules.Evaluation.Monitors;

/// <summary>
/// Rate of change across a window, measured back from the newest sample (not from "now"), so the result changes
/// only when a sample arrives: (newest − reference) / elapsed, where the reference is the newest sample at least
/// one window older than the newest.
/// </summary>
internal sealed class RateMonitor(RateCondition condition) : ConditionMonitor
{
    public override MonitorResult Evaluate(EvaluationContext context)
    {
        var samples = context.History.Of(condition.Point);
        if (samples.Count < 2 || samples[^1].Value is not NumericValue newest)
        {
            return MonitorResult.NoData;
        }

        var cutoff = samples[^1].Time - condition.Window;
        for (var i = samples.Count - 2; i >= 0; i--)
        {
            if (samples[i].Time <= cutoff && samples[i].Value is NumericValue reference)
            {
                var elapsedS = (samples[^1].Time - samples[i].Time).TotalSeconds;
                var ratePerSecond = (newest.ValueSi - reference.ValueSi) / elapsedS;
                return new MonitorResult(double.IsFinite(ratePerSecond) && condition.ThresholdPerSecond.Holds(ratePerSecond), [samples[i], samples[^1]]);
            }
        }

        return MonitorResult.NoData;
    }
}
