using static DescentOps.Scenarios.Format.QuantityKind;

namespace DescentOps.Scenarios.Format;

/// <summary>The optional <c>onboard_sampling</c> section: the probe's sensor rates apart from its frames.</summary>
public static class OnboardSamplingFormat
{
    public static SectionField Section { get; } = new("onboard_sampling",
        "How often the probe's on-board software reads its sensors, apart from the frames it sends home; on-board rules evaluate on these samples, ground rules only on frames. Omit for samples at the telemetry interval (the frames).",
        [
            new QuantityField("interval", "Sampling interval of every point no entry names (default: the telemetry interval).", Duration, 0.001, 86_400, Required: false),
            new ChoiceField("crossings", "exact (default): a limit check on depth, ice temperature, tilt, battery charge or buffer fill fires at the instant the limit is crossed, found by root finding on the physics; at_samples: at the first sample past it.", ["exact", "at_samples"], Required: false),
            new ListField("points", "Intervals for single points or groups (motion, thermal, power, link); a point's entry wins over its group's.", new SectionField("entry", "One point or group.",
            [
                new ChoiceField("name", "A probe telemetry point or a group.", Model.OnboardSamplingGroups.Names),
                new QuantityField("interval", "Its sampling interval.", Duration, 0.001, 86_400),
            ]), MinItems: 0, MaxItems: 64, Required: false),
        ], Required: false);
}
