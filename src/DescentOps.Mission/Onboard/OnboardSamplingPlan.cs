using System.Collections.Immutable;
using DescentOps.Primitives.Time;
using DescentOps.Rules.Compiled;
using DescentOps.Scenarios.Model;

namespace DescentOps.Mission.Onboard;

/// <summary>
/// How the probe samples for its on-board rules: the points they read, each with its sampling grid, and whether a limit
/// crossing is placed at its exact instant. Only the points some on-board rule reads are sampled at all.
/// </summary>
public sealed class OnboardSamplingPlan
{
    /// <summary>Points whose value between events the physics gives in closed form, so a crossing has an exact instant.</summary>
    public static IReadOnlySet<string> ClosedForm { get; } = new HashSet<string>(StringComparer.Ordinal)
    {
        "probe.depth", "probe.ice_temperature", "probe.battery_soc", "probe.tilt", "probe.buffer_fill",
    };

    private OnboardSamplingPlan(OnboardWatch watch, ImmutableSortedDictionary<string, SampleGrid> grids, bool exactCrossings)
    {
        Watch = watch;
        Grids = grids;
        ExactCrossings = exactCrossings;
    }

    public OnboardWatch Watch { get; }

    public ImmutableSortedDictionary<string, SampleGrid> Grids { get; }

    public bool ExactCrossings { get; }

    public bool IsExact(string point) => ExactCrossings && ClosedForm.Contains(point);

    /// <summary>
    /// The plan of a scenario, or null when the on-board rules see the frames as they always did: no
    /// <c>onboard_sampling</c> section, no on-board rule, or every watched point sampled with the frames and no exact
    /// crossings (a sensor read once per frame is read by the frame, so the frame's readings are its samples).
    /// </summary>
    public static OnboardSamplingPlan? For(Scenario scenario, CompiledRuleSet? rules)
    {
        if (scenario.OnboardSampling is not { } sampling || rules is null) return null;
        var watch = OnboardWatch.From(rules);
        if (watch.IsEmpty) return null;
        var frameS = scenario.Probe.TelemetryIntervalS;
        var frameTicks = SimDuration.FromSeconds(frameS).Ticks;
        var grids = watch.Points.ToImmutableSortedDictionary(
            p => p,
            p => new SampleGrid(Math.Max(1, SimDuration.FromSeconds(sampling.IntervalOf(p, frameS)).Ticks)),
            StringComparer.Ordinal);
        if (!sampling.ExactCrossings && grids.Values.All(g => g.IntervalTicks == frameTicks)) return null;
        return new OnboardSamplingPlan(watch, grids, sampling.ExactCrossings);
    }
}
