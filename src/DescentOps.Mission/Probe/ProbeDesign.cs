using DescentOps.Physics.Descent;
using DescentOps.Primitives.Time;
using DescentOps.Scenarios.Model;

namespace DescentOps.Mission.Probe;

/// <summary>
/// What a probe is built from, fixed for a run: the scenario's probe and shell, the descent model, the power system
/// (null without one) and the telemetry interval. Every part of the probe's logic reads it; none changes it.
/// </summary>
public sealed class ProbeDesign
{
    public ProbeDesign(Scenario scenario)
    {
        Scenario = scenario;
        Descent = ProbeDescentFactory.Model(scenario);
        FrameInterval = SimDuration.FromSeconds(scenario.Probe.TelemetryIntervalS);
        WatchedByFaults = Faults.FaultInjectorComponent.WatchesTrueState(scenario);
        Power = scenario.Power is { } power ? new ProbePowerSystem(power, scenario.Probe) : null;
    }

    public Scenario Scenario { get; }

    public ProbeModel Probe => Scenario.Probe;

    public double ShellThicknessM => Scenario.Shell.ThicknessM;

    public ProbeDescentModel Descent { get; }

    public SimDuration FrameInterval { get; }

    /// <summary>Whether some fault starts on a condition of the true state, so the injector needs the true frames.</summary>
    public bool WatchedByFaults { get; }

    public ProbePowerSystem? Power { get; }

    /// <summary>How the probe samples for its on-board rules apart from its frames; null: they see the frames.</summary>
    public Onboard.OnboardSamplingPlan? Onboard { get; init; }

    /// <summary>The ids of the lander this probe belongs to, and so of the components it sends to.</summary>
    public LanderIds Ids { get; init; } = LanderIds.Single;
}
