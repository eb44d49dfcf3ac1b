using DescentOps.Engine.Components;
using DescentOps.Mission.Messages;
using DescentOps.Mission.Probe;
using DescentOps.Primitives.Time;

namespace DescentOps.Mission.Onboard;

/// <summary>
/// The probe's on-board sampling: after every event the probe handles, one timer is kept at the earliest instant some
/// watched point must be read (<see cref="OnboardSchedule"/>); when it comes, the due points are read as their sensors
/// report them and sent to the on-board autonomy at once. Nothing is journaled per sample.
/// </summary>
public static class OnboardSampler
{
    /// <summary>Replaces the pending sample timer by one at the next due instant.</summary>
    public static ProbeState Rearm(ProbeDesign design, OnboardSamplingPlan plan, ProbeState state, ComponentContext context)
    {
        var sampler = state.Onboard ?? OnboardSamplerState.Empty;
        if (sampler.Pending is { } pending) context.Cancel(pending);
        var now = context.Now;
        var horizon = ProbeStepPlanner.NextStepAt(design, ProbeMotion.Advance(design, state, now), now);
        SimTime? next = null;
        foreach (var point in plan.Watch.Points)
        {
            if (OnboardSchedule.Next(plan, design, state, sampler, point, now, horizon) is { } due && (next is null || due.At < next))
            {
                next = due.At;
            }
        }

        var handle = next is { } at ? context.ScheduleSelf(at - now, ProbeSampleDue.Instance, MissionPriority.Telemetry) : (Engine.Scheduling.EventHandle?)null;
        return state with { Onboard = sampler with { Pending = handle } };
    }

    /// <summary>Reads the points due now, sends them to the on-board rules, and rearms.</summary>
    public static ProbeState Take(ProbeDesign design, OnboardSamplingPlan plan, ProbeState state, ComponentContext context)
    {
        var sampler = (state.Onboard ?? OnboardSamplerState.Empty) with { Pending = null };
        var now = context.Now;
        var horizon = ProbeStepPlanner.NextStepAt(design, ProbeMotion.Advance(design, state, now), now);
        var moved = ProbeMotion.Advance(design, state, now);
        var truth = ProbeSensors.TrueReadings(design, moved);
        var readings = new List<OnboardReading>();
        var sent = sampler.Sent;
        foreach (var point in plan.Watch.Points)
        {
            if (OnboardSchedule.Next(plan, design, state, sampler, point, now, horizon) is not { } due || due.At != now) continue;
            if (point == Scenarios.Model.OnboardSamplingGroups.RegimePoint)
            {
                readings.Add(new OnboardReading(point, 0.0, state.Regime.ToString(), false));
                sent = sent.SetItem(point, new SentSample(now, 0.0, state.Regime.ToString()));
                continue;
            }

            var value = truth.First(r => r.Point == point).Value;
            // Noise is drawn here, once per sample, from the probe's stream, like a frame's; other faults act the same way.
            var reported = ProbeSensors.Reported([(point, value)], state.SensorFaults, context.Random);
            if (reported.Count == 0) continue;
            readings.Add(new OnboardReading(point, reported[0].Value, null, due.AtCrossing));
            sent = sent.SetItem(point, new SentSample(now, reported[0].Value, null));
        }

        if (readings.Count > 0)
        {
            context.Schedule(design.Ids.Autonomy, SimDuration.Zero, new OnboardSamples(now, readings), MissionPriority.Telemetry);
        }

        return Rearm(design, plan, state with { Onboard = sampler with { Sent = sent } }, context);
    }
}
