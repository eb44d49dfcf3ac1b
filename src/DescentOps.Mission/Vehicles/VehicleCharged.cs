namespace DescentOps.Mission.Vehicles;

/// <summary>The vehicle's own timer: the battery is full at the dock.</summary>
public sealed record VehicleCharged;
