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
    TurbineModel? Turbine)
{
    /// <summary>Share of the source's waste heat (thermal less electric output) that reaches the melting head (default 0).</summary>
    public double WasteHeatToHead { get; init; }

    /// <summary>Share of the source's waste heat that reaches the side wall (default 0); head and wall add up to at most 1.</summary>
    public double WasteHeatToWall { get; init; }
}
