namespace DescentOps.Physics.Power;

/// <summary>Core heat, electric output and rejected heat of a fission source.</summary>
public sealed record FissionOutput(double ThermalPowerW, double ElectricPowerW, double WasteHeatW);
