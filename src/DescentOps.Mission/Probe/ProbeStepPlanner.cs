using DescentOps.Physics.Power;
using DescentOps.Primitives.Time;

namespace DescentOps.Mission.Probe;

/// <summary>
/// When the probe must next look at itself: the next telemetry frame, the next depth it crosses (end of the
/// sublimation zone, the ocean, an armed depth trigger) or the instant the battery runs dry, whichever comes first.
/// Pure: the component schedules the step the planner names.
/// </summary>
public static class ProbeStepPlanner
{
    /// <summary>Longest timer worth scheduling, 1e10 s (about 300 years): longer means never within a run.</summary>
    public const double MaxTimerS = 1e10;

    public static SimTime NextStepAt(ProbeDesign design, ProbeState state, SimTime now)
    {
        var next = state.NextFrameAt;
        if (ProbeHeaters.IsMoving(state.Regime) && state.VelocityMPerS > 0)
        {
            var target = state.Regime == ProbeRegime.Sublimating ? design.Descent.LiquidOnsetDepthM : design.ShellThicknessM;
            foreach (var trigger in state.DepthTriggers)
            {
                if (trigger.DepthM > state.DepthM) target = Math.Min(target, trigger.DepthM);
            }

            var remaining = Math.Max(0.0, target - state.DepthM);
            // Rounded up to the next tick so the step lands on or just past the boundary, never just short of it.
            var vertical = Math.Max(state.VelocityMPerS * Math.Cos(state.TiltRad), 1e-12);
            var crossing = now + new SimDuration((long)Math.Ceiling(Math.Min(remaining / vertical, 1e12) * SimDuration.TicksPerSecond));
            if (crossing < next) next = SimTime.Max(crossing, now);
        }

        if (state.Bus is { } bus && design.Power!.Battery is { } battery)
        {
            // The bus changes when the battery runs dry: a step at that instant (rounded up to a tick) reallocates it.
            var emptyS = PowerBus.TimeToEmptyS(bus.Allocation, bus.StateOfCharge, battery);
            if (emptyS < MaxTimerS)
            {
                var empty = now + new SimDuration((long)Math.Ceiling(emptyS * SimDuration.TicksPerSecond));
                if (empty < next) next = empty;
            }
        }

        return next;
    }
}
