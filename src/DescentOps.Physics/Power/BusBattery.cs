namespace DescentOps.Physics.Power;

/// <summary>
/// A battery as the bus sees it: the cells (<see cref="Cells"/>, charge bookkeeping in coulombs), the nominal voltage
/// that turns bus power into cell current, the share of the cells' output that reaches the bus, the power limits of
/// its converter, and the cell temperature that derates its capacity.
/// </summary>
/// <param name="Cells">The pack; its coulombic efficiency is the charge efficiency.</param>
/// <param name="NominalVoltageV">Pack voltage; state of charge does not depend on it, only the coulomb figures do.</param>
/// <param name="DischargeEfficiency">Share of the cells' energy that reaches the bus while discharging.</param>
/// <param name="MaxDischargePowerW">Most power the pack gives the bus.</param>
/// <param name="MaxChargePowerW">Most power the pack takes from the bus.</param>
/// <param name="CellTemperatureK">Cell temperature, held constant (the heat source's waste heat keeps the pack warm).</param>
public sealed record BusBattery(
    BatteryParameters Cells,
    double NominalVoltageV,
    double DischargeEfficiency,
    double MaxDischargePowerW,
    double MaxChargePowerW,
    double CellTemperatureK)
{
    /// <summary>Energy the cells hold when full at their temperature, Q_eff·V.</summary>
    public double EffectiveCapacityJ =>
        Cells.NominalCapacityC * Battery.ColdCapacityFactor(CellTemperatureK) * Cells.AgeFactor * NominalVoltageV;
}
