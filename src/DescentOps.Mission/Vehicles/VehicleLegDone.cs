namespace DescentOps.Mission.Vehicles;

/// <summary>The vehicle's own timer: the leg under way is over, or (<see cref="BatteryEmpty"/>) its battery ran flat on it.</summary>
public sealed record VehicleLegDone(bool BatteryEmpty);
