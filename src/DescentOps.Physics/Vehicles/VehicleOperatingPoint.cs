namespace DescentOps.Physics.Vehicles;

/// <summary>Drag, propulsive and total power, energy per metre, and what a battery buys at one speed.</summary>
public sealed record VehicleOperatingPoint(double SpeedMPerS, double DragN, double PropulsivePowerW, double TotalPowerW, double EnergyPerMetreJPerM, double EnduranceS, double RangeM);
