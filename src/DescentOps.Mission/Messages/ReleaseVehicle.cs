namespace DescentOps.Mission.Messages;

/// <summary>
/// The probe lets a vehicle go at the ice-ocean interface, telling it the depth, the sea pressure there (the ice
/// overburden) and the water's temperature at the base of the ice.
/// </summary>
public sealed record ReleaseVehicle(double InterfaceDepthM, double BasePressurePa = 0.0, double BaseTemperatureK = 273.15);
