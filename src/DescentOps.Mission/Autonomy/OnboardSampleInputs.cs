using DescentOps.Mission.Messages;
using DescentOps.Rules.Evaluation;

namespace DescentOps.Mission.Autonomy;

/// <summary>The on-board sampler's readings as rule samples, each saying whether it was taken at a crossing or on its grid.</summary>
public static class OnboardSampleInputs
{
    public const string Crossing = "crossing";
    public const string Sample = "sample";

    public static IReadOnlyList<TelemetrySample> Of(OnboardSamples samples) =>
    [
        .. samples.Readings.Select(r => new TelemetrySample(
            r.Point,
            samples.SampledAt,
            r.State is { } state ? new DiscreteValue(state) : new NumericValue(r.Value)) { Origin = r.AtCrossing ? Crossing : Sample }),
    ];
}
