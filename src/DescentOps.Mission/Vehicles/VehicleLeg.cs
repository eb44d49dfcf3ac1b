using DescentOps.Primitives.Time;

namespace DescentOps.Mission.Vehicles;

/// <summary>
/// A leg under way: from <see cref="StartAt"/> and <see cref="StartPosition"/> with <see cref="StartBatteryJ"/>, moving at
/// <see cref="GroundVelocity"/> (water velocity plus current) for <see cref="Seconds"/>, drawing <see cref="PowerW"/>, with
/// <see cref="EndEnergyJ"/> paid at its end. An entrapped vehicle is on a leg that never ends by itself.
/// </summary>
public sealed record VehicleLeg(
    PlannedLeg Plan,
    SimTime StartAt,
    OceanVector StartPosition,
    double StartBatteryJ,
    OceanVector WaterVelocity,
    OceanVector GroundVelocity,
    double PowerW,
    double Seconds,
    double EndEnergyJ,
    bool Home,
    bool Held)
{
    public OceanVector PositionAfter(double seconds) => StartPosition + (GroundVelocity * seconds);

    public double BatteryAfter(double seconds) => StartBatteryJ - (PowerW * seconds);
}
