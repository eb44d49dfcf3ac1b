using DescentOps.Engine.Scheduling;
using DescentOps.Primitives.Time;

namespace DescentOps.Mission.Probe;

/// <summary>
/// The probe's committed state. Velocity is held constant between events, so the depth at any instant is
/// exact: DepthM + VelocityMPerS × (t − LastUpdate).
/// </summary>
public sealed record ProbeState(
    ProbeRegime Regime,
    SimTime LastUpdate,
    double DepthM,
    double VelocityMPerS,
    double PowerFraction,
    double EnergyUsedJ,
    long FramesSent,
    SimTime NextFrameAt,
    EventHandle? PendingStep,
    SimTime? BreakthroughAt,
    int VehiclesActive,
    int VehiclesFinished);
