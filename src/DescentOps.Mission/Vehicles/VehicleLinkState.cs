using DescentOps.Primitives.Time;

namespace DescentOps.Mission.Vehicles;

/// <summary>
/// The vehicle's side of the acoustic link: data messages made, delivered and held for later, whether contact is up,
/// since when it has been down, and when and after how much running the last position fix came.
/// </summary>
public sealed record VehicleLinkState(
    bool Up,
    SimTime? DownSince,
    long Produced,
    long Delivered,
    long Held,
    bool Faulted,
    SimTime LastFixAt,
    double WaterDistanceAtFixM)
{
    public static VehicleLinkState Initial { get; } = new(true, null, 0, 0, 0, false, SimTime.Epoch, 0.0);
}
