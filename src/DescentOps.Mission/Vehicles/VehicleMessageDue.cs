namespace DescentOps.Mission.Vehicles;

/// <summary>The vehicle's own timer: time to send a data message to the probe.</summary>
public sealed record VehicleMessageDue;
