using DescentOps.Mission.Messages;
using DescentOps.Rules.Evaluation;

namespace DescentOps.Mission.Autonomy;

/// <summary>A telemetry frame as the rule evaluator reads it: one sample per point, stamped with the sampling time.</summary>
public static class FrameSamples
{
    public static IEnumerable<TelemetrySample> Of(TelemetryFrame frame)
    {
        var t = frame.SampledAt;
        foreach (var (point, value) in frame.Readings)
        {
            yield return new TelemetrySample(point, t, new NumericValue(value));
        }

        yield return new TelemetrySample("probe.regime", t, new DiscreteValue(frame.Regime));
        foreach (var (point, state) in frame.DiscreteReadings)
        {
            yield return new TelemetrySample(point, t, new DiscreteValue(state));
        }
    }
}
