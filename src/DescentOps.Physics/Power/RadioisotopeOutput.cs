namespace DescentOps.Physics.Power;

/// <summary>Heat released, electric power delivered and heat rejected by a radioisotope source at one time.</summary>
public sealed record RadioisotopeOutput(double ThermalPowerW, double ElectricPowerW, double WasteHeatW);
