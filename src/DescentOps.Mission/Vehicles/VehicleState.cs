namespace DescentOps.Mission.Vehicles;

/// <summary>A vehicle's committed state: where it is in its profile and what is left in its battery.</summary>
public sealed record VehicleState(bool Released, bool Finished, bool Descending, double BatteryJ, int ProfilesCompleted, double InterfaceDepthM);
