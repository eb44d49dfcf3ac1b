namespace DescentOps.Mission.Messages;

/// <summary>The probe lets a vehicle go at the ice-ocean interface.</summary>
public sealed record ReleaseVehicle(double InterfaceDepthM);
