using DescentOps.Physics.Ocean;
using DescentOps.Physics.Seawater;
using DescentOps.Physics.Vehicles;
using DescentOps.Primitives.Time;
using DescentOps.Scenarios.Envelope;
using DescentOps.Scenarios.Model;

namespace DescentOps.Mission.Vehicles;

/// <summary>
/// What a vehicle is built from, fixed for a run: its model, the scenario's acoustics and body, whether its dock charges
/// from the probe's bus, and the current. Every part of the vehicle's logic reads it; none changes it.
/// </summary>
public sealed class VehicleDesign
{
    public VehicleDesign(VehicleModel vehicle, Scenario scenario, LanderIds ids)
    {
        Ids = ids;
        ArgumentNullException.ThrowIfNull(vehicle);
        ArgumentNullException.ThrowIfNull(scenario);
        Vehicle = vehicle;
        Scenario = scenario;
        Acoustics = scenario.Acoustics;
        DockOnProbeBus = scenario.Power is not null;
        Current = vehicle.Current is { } c ? OceanVector.Horizontal(c.SpeedMPerS, c.DirectionRad) : OceanVector.Zero;
    }

    public VehicleModel Vehicle { get; }

    /// <summary>The ids of the lander the vehicle belongs to (its probe's, above all).</summary>
    public LanderIds Ids { get; }

    public Scenario Scenario { get; }

    public AcousticsModel? Acoustics { get; }

    /// <summary>With a power system on the probe the dock's charger draws on the probe's bus, which may shed it.</summary>
    public bool DockOnProbeBus { get; }

    /// <summary>The current's velocity, which every leg drifts with.</summary>
    public OceanVector Current { get; }

    public double MessageIntervalS => Acoustics?.MessageIntervalS ?? Scenarios.Loading.ScenarioLoader.DefaultMessageIntervalS;

    /// <summary>The water under the shell by TEOS-10, at the pressure the probe reported at release.</summary>
    public OceanUnderShell Ocean(VehicleState state) => ScenarioOcean.At(Scenario, state.BasePressurePa);

    /// <summary>The modem link at the release depth's water; null without an acoustics section.</summary>
    public VehicleAcousticLink? Link(VehicleState state) =>
        Acoustics is null ? null : VehicleAcousticLink.For(Acoustics, Scenario, Ocean(state),
            SeawaterPressureDepth.StandardOceanDepthM(OceanUnderShell.SeaPressurePa(state.BasePressurePa), ScenarioOcean.StandardGravityMPerS2));

    public VehiclePerformance Performance(VehicleState state)
    {
        var needsWater = Vehicle.Kind == VehicleKind.Glider || Vehicle.Hull is not null;
        var density = needsWater ? Ocean(state).DensityKgPerM3 : double.NaN;
        return VehiclePerformance.For(Vehicle, density, Scenario.Body.GravityMPerS2, state.BasePressurePa);
    }

    /// <summary>One-sigma dead-reckoning error since the last fix, plus the drift of the current the vehicle does not know.</summary>
    public double NavigationErrorM(VehicleState state, SimTime now)
    {
        var elapsed = Math.Max(0.0, (now - state.Link.LastFixAt).TotalSeconds);
        var distance = Math.Max(0.0, VehicleLegs.WaterDistanceNow(state, now) - state.Link.WaterDistanceAtFixM);
        var nav = Vehicle.Navigation;
        var sigma = nav is null ? 0.0 : DeadReckoning.PositionSigmaM(0.0, nav.ErrorPerDistance, distance, nav.RandomWalkM2PerS, elapsed);
        return sigma + Math.Abs(DeadReckoning.UnmodelledCurrentErrorM(Vehicle.Current?.SpeedMPerS ?? 0.0, elapsed));
    }
}
