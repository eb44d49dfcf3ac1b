namespace DescentOps.Scenarios.Model;

/// <summary>
/// The probe's electrical power system. With it, a power dip lowers the source's output and the bus decides which
/// loads run; without it (null in <see cref="Scenario.Power"/>) a dip scales the heater power directly.
/// <see cref="ThermalPowerW"/>, <see cref="DegradationPerYear"/> and <see cref="FuelAgeS"/> describe a radioisotope
/// source; <see cref="ElectricPowerW"/> a fission source. <see cref="Loads"/> always holds one head heater, one wall
/// heater and one electronics load.
/// </summary>
public sealed record PowerModel(
    PowerSourceKind Source,
    double ThermalPowerW,
    double ConversionEfficiency,
    double DegradationPerYear,
    double FuelAgeS,
    double ElectricPowerW,
    BatteryModel? Battery,
    IReadOnlyList<BusLoadModel> Loads,
    TurbineModel? Turbine);
