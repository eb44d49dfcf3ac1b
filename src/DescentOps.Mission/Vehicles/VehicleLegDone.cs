namespace DescentOps.Mission.Vehicles;

/// <summary>The vehicle's own timer: the current leg of its profile (down or up) is over.</summary>
public sealed record VehicleLegDone(double EnergyJ);
