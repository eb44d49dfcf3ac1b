using DescentOps.Engine.Scheduling;
using DescentOps.Primitives.Time;

namespace DescentOps.Mission.Vehicles;

/// <summary>
/// A vehicle's committed state. Battery, position and distance run are as of the start of <see cref="Leg"/> (or of the
/// last stop when there is none): a leg is only committed at its end or when something interrupts it, so that the
/// figures at a leg's end come from the planned leg itself and not from the rounding of event times.
/// </summary>
public sealed record VehicleState(
    VehiclePhase Phase,
    double BatteryJ,
    OceanVector Position,
    VehicleLeg? Leg,
    VehicleLeg? Suspended,
    int ProfilesCompleted,
    int Cycle,
    int LegIndex,
    int Sortie,
    double InterfaceDepthM,
    double BasePressurePa,
    double BaseTemperatureK,
    double WaterDistanceM,
    double EnergyUsedJ,
    double EnergyChargedJ,
    VehicleLinkState Link,
    bool Recalled,
    bool RecallHeld,
    EventHandle? PendingTimer,
    EventHandle? PendingTick)
{
    public bool Released => Phase != VehiclePhase.Stowed;

    public bool Finished => Phase == VehiclePhase.Done;

    /// <summary>Power the probe's bus gives the dock's charger now (charging on the probe's bus only).</summary>
    public double DockChargeW { get; init; }

    /// <summary>Since when <see cref="DockChargeW"/> has held, so the energy charged at it can be booked.</summary>
    public SimTime DockChargeSince { get; init; }
}
