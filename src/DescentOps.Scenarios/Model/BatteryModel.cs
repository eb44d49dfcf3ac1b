namespace DescentOps.Scenarios.Model;

/// <summary>
/// The probe's battery: capacity at 25 °C, the converter's power limits, charge and discharge efficiencies, charge at
/// the start of the run and the (constant) cell temperature that derates the capacity.
/// </summary>
public sealed record BatteryModel(
    double CapacityJ,
    double MaxDischargePowerW,
    double MaxChargePowerW,
    double ChargeEfficiency,
    double DischargeEfficiency,
    double InitialStateOfCharge,
    double CellTemperatureK);
