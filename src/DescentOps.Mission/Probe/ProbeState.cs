using System.Collections.Immutable;
using DescentOps.Engine.Scheduling;
using DescentOps.Primitives.Time;

namespace DescentOps.Mission.Probe;

/// <summary>
/// The probe's committed state. Velocity is held constant between events, so the depth at any instant is
/// exact: DepthM + VelocityMPerS × (t − LastUpdate). <see cref="MeltFreeRefusedAtWallW"/> remembers the wall power
/// at which a frozen-in probe was found unable to melt free, so the (costly) estimate is redone only when that changes.
/// The probe moves along its axis, tilted by <see cref="TiltRad"/> from the vertical in its steering plane, so depth
/// grows at v·cos θ and <see cref="LateralDriftM"/> at v·sin θ.
/// <see cref="HeldAtSurface"/> keeps the probe still, heaters off, until the station ends the surface dwell.
/// <see cref="ActiveDips"/> holds the power dips in force by name; <see cref="PowerFraction"/> is the smallest share they leave.
/// <see cref="Bus"/> is null for a probe without a power system (a dip then scales the heater power directly).
/// <see cref="BufferFill"/> is the share of the probe-end frame buffer in use, as the link last told it.
/// </summary>
public sealed record ProbeState(
    ProbeRegime Regime,
    SimTime LastUpdate,
    double DepthM,
    double VelocityMPerS,
    double LastMovingVelocityMPerS,
    double PowerFraction,
    double EnergyUsedJ,
    long FramesSent,
    SimTime NextFrameAt,
    EventHandle? PendingStep,
    EventHandle? PendingThermal,
    bool WallDeficit,
    double? MeltFreeRefusedAtWallW,
    SimTime? BreakthroughAt,
    int VehiclesActive,
    int VehiclesFinished,
    double HeadSetpointW,
    double WallSetpointW,
    bool Paused,
    ImmutableList<ActiveSensorFault> SensorFaults,
    ImmutableList<ArmedDepthTrigger> DepthTriggers,
    ImmutableSortedDictionary<string, double> ActiveDips,
    double TiltRad,
    double LateralDriftM,
    double SegmentLossFraction,
    double SteeringW,
    ProbeBusState? Bus = null,
    bool HeldAtSurface = false,
    int VehiclesLost = 0,
    double BufferFill = 0.0)
{
    /// <summary>The path that carries the frames, as the link last told the probe (<see cref="Tether.LinkPaths"/>).</summary>
    public string LinkPath { get; init; } = Tether.LinkPaths.Fibre;

    /// <summary>Depth down to which the shell's debris bands have been accounted for (tilt scatter, debris on the head).</summary>
    public double DebrisAccountedToM { get; init; }

    /// <summary>Thickness of the debris deposit collected on the head so far.</summary>
    public double DebrisOnHeadM { get; init; }

    /// <summary>When the probe last stopped (a stall, a pause or a refreeze stall); the hold before melting free counts from here.</summary>
    public SimTime? StoppedAt { get; init; }

    /// <summary>The on-board sampler's pending timer and last samples; null without on-board sampling.</summary>
    public Onboard.OnboardSamplerState? Onboard { get; init; }

    /// <summary>Charging power each docked vehicle asks of the bus, by vehicle name.</summary>
    public ImmutableSortedDictionary<string, double> DockDemandsW { get; init; } = ImmutableSortedDictionary<string, double>.Empty.WithComparers(StringComparer.Ordinal);

    /// <summary>Heat the jets are set to put into the water (0: off); only a probe with jets.</summary>
    public double JetSetpointW { get; init; }

    /// <summary>Hole radius the jets are set to cut.</summary>
    public double JetHoleRadiusM { get; init; }

    /// <summary>Share of the jets' heat that reaches the hole's bottom: 1, less while a nozzle is clogged.</summary>
    public double NozzleShare { get; init; } = 1.0;

    /// <summary>Radius of the jet-cut hole around the body; 0 while the head cuts the hole itself.</summary>
    public double JetHoleAroundBodyM { get; init; }

    /// <summary>Heat at the bottom and hole radius of the jets' operating point last logged.</summary>
    public (double HeatW, double HoleRadiusM)? JetLogged { get; init; }

    /// <summary>What the bus last granted each docked vehicle, as the vehicle was told.</summary>
    public ImmutableSortedDictionary<string, double> DockGrantedW { get; init; } = ImmutableSortedDictionary<string, double>.Empty.WithComparers(StringComparer.Ordinal);
}

/// <summary>A fault that starts when the head reaches a depth.</summary>
public sealed record ArmedDepthTrigger(int FaultIndex, double DepthM);
