using DescentOps.Mission.Probe;
using DescentOps.Primitives.Time;

namespace DescentOps.Mission.Onboard;

/// <summary>
/// When each watched point must next be read for the on-board rules. A limit check's verdict changes only when its
/// point's reading changes side of a limit, so a point read only by limit and state checks is read when that can
/// happen: at the crossing instant itself when the point is closed-form and crossings are exact, otherwise at the first
/// sample of its grid past the crossing, or past an event that moved it. Samples in between would give the rules the
/// verdicts they already hold. A point some check needs at every sample (a rate, a step, a count of samples) or whose
/// sensor is noisy is read at every instant of its grid. Pure: no context, no draws.
/// </summary>
public static class OnboardSchedule
{
    /// <summary>The next reading of <paramref name="point"/> at or after <paramref name="now"/>, or null for none (a dropped sensor).</summary>
    public static SampleDue? Next(OnboardSamplingPlan plan, ProbeDesign design, ProbeState state, OnboardSamplerState sampler, string point, SimTime now, SimTime horizon)
    {
        var grid = plan.Grids[point];
        sampler.Sent.TryGetValue(point, out var sent);
        if (point == Scenarios.Model.OnboardSamplingGroups.RegimePoint)
        {
            return sent is null || sent.State != state.Regime.ToString() ? new SampleDue(grid.AtOrAfter(now), false) : null;
        }

        var fault = OnboardReadings.FaultOn(state, point);
        if (OnboardReadings.Reported(fault, 0.0) is null) return null;
        if (sent is null) return new SampleDue(grid.AtOrAfter(now), false);

        SampleDue? due = null;
        if (OnboardReadings.IsNoisy(fault) || plan.Watch.EverySample.Contains(point))
        {
            due = new SampleDue(SimTime.Max(grid.After(sent.At), grid.AtOrAfter(now)), false);
            if (OnboardReadings.IsNoisy(fault)) return due;
        }

        var limits = plan.Watch.Boundaries[point];
        var exact = plan.IsExact(point);
        var current = OnboardReadings.Reported(fault, OnboardReadings.TrueAt(design, state, point, now))!.Value;
        if (!LimitSide.Same(current, sent.Value, limits))
        {
            // An event moved the reading across a limit (a command, a fault, a jump in the physics).
            return Earlier(due, exact ? new SampleDue(now, true) : new SampleDue(grid.AtOrAfter(now), false));
        }

        if (horizon <= now || limits.Length == 0) return due;
        double ValueAt(long tick) => OnboardReadings.Reported(fault, OnboardReadings.TrueAt(design, state, point, new SimTime(tick)))!.Value;
        var end = ValueAt(horizon.Ticks);
        foreach (var limit in limits)
        {
            if (LimitSide.Of(end, limit) == LimitSide.Of(current, limit)) continue;
            if (CrossingFinder.FirstTickPast(ValueAt, now.Ticks, horizon.Ticks, limit) is not { } tick) continue;
            var crossing = new SimTime(tick);
            due = Earlier(due, exact ? new SampleDue(crossing, true) : new SampleDue(grid.AtOrAfter(crossing), false));
        }

        return due;
    }

    private static SampleDue? Earlier(SampleDue? a, SampleDue b) => a is { } x && x.At <= b.At ? x : b;
}
