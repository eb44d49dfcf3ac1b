namespace DescentOps.Physics.Power;

/// <summary>
/// A probe's electrical bus: a source (and a harvester) feed prioritised loads, a battery fills the gap up to its
/// converter's limit while it holds charge, and what the loads leave charges it. Shedding is
/// <see cref="LoadShedding.Allocate"/> over source + harvester + battery; surplus the battery cannot take is
/// curtailed (a shunt), because a heat source cannot be switched off.
/// </summary>
public static class PowerBus
{
    private const string Model = "the probe's power bus";

    /// <summary>
    /// Allocates the bus for the present instant. The battery discharges only while it holds charge and
    /// <paramref name="dischargeAllowed"/> (a bus controller may keep an emptied battery off until it has recharged);
    /// it takes charge whenever there is surplus.
    /// </summary>
    public static BusAllocation Allocate(double sourcePowerW, double harvestPowerW, double stateOfCharge, BusBattery? battery, IReadOnlyCollection<PoweredLoad> loads, bool dischargeAllowed = true)
    {
        ValidRange.RequireNonNegative(sourcePowerW, nameof(sourcePowerW), "W", Model);
        ValidRange.RequireNonNegative(harvestPowerW, nameof(harvestPowerW), "W", Model);
        ValidRange.Require(stateOfCharge, 0.0, 1.0, nameof(stateOfCharge), "(fraction)", Model);
        var generated = sourcePowerW + harvestPowerW;
        var dischargeLimitW = battery is not null && stateOfCharge > 0 && dischargeAllowed ? battery.MaxDischargePowerW : 0.0;
        var loadAllocation = LoadShedding.Allocate(generated + dischargeLimitW, loads);
        var dischargeW = Math.Max(0.0, loadAllocation.SuppliedPowerW - generated);
        var spareW = Math.Max(0.0, generated - loadAllocation.SuppliedPowerW);
        var chargeW = battery is null ? 0.0 : Math.Min(spareW, battery.MaxChargePowerW);
        return new BusAllocation(loadAllocation, generated + dischargeLimitW, sourcePowerW, harvestPowerW, dischargeW, chargeW, spareW - chargeW);
    }

    /// <summary>
    /// Holds an allocation for <paramref name="durationS"/>. The battery is stepped by <see cref="Battery.Step"/> at
    /// the cell current the bus power asks for (I = P/(η_d·V) discharging, P/V charging); if it runs dry within the
    /// step the loads lose the rest, counted as unserved; charge it refuses (full, or too cold) is curtailed.
    /// </summary>
    public static BusStep Advance(BusAllocation allocation, double stateOfCharge, BusBattery? battery, double durationS)
    {
        ArgumentNullException.ThrowIfNull(allocation);
        ValidRange.RequireNonNegative(durationS, nameof(durationS), "s", Model);
        var sourceJ = allocation.SourcePowerW * durationS;
        var harvestJ = allocation.HarvestPowerW * durationS;
        var loadsJ = allocation.Loads.SuppliedPowerW * durationS;
        var curtailedJ = allocation.CurtailedW * durationS;
        if (battery is null)
        {
            return new BusStep(stateOfCharge, new BusEnergy(sourceJ, harvestJ, 0, 0, loadsJ, 0, curtailedJ, 0, 0));
        }

        var v = battery.NominalVoltageV;
        var currentA = allocation.BatteryDischargeW > 0
            ? allocation.BatteryDischargeW / (battery.DischargeEfficiency * v)
            : -allocation.BatteryChargeW / v;
        var step = Battery.Step(stateOfCharge, currentA, durationS, battery.CellTemperatureK, battery.Cells);
        var outJ = step.DeliveredChargeC * v * battery.DischargeEfficiency;
        var unservedJ = step.ShortfallC * v * battery.DischargeEfficiency;
        var inJ = step.AcceptedChargeC * v;
        var lossJ = (step.ChargingLossC * v) + (step.DeliveredChargeC * v * (1.0 - battery.DischargeEfficiency));
        return new BusStep(
            step.StateOfCharge,
            new BusEnergy(sourceJ, harvestJ, outJ, inJ, loadsJ - unservedJ, unservedJ, curtailedJ + (step.RejectedChargeC * v), lossJ, step.SelfDischargeC * v));
    }

    /// <summary>
    /// Time until a discharging battery is empty, stored energy over cell power, self-discharge neglected (it is two
    /// per cent a month against kilowatts); infinite when it is not discharging.
    /// </summary>
    public static double TimeToEmptyS(BusAllocation allocation, double stateOfCharge, BusBattery battery)
    {
        ArgumentNullException.ThrowIfNull(allocation);
        ArgumentNullException.ThrowIfNull(battery);
        if (allocation.BatteryDischargeW <= 0) return double.PositiveInfinity;
        return stateOfCharge * battery.EffectiveCapacityJ * battery.DischargeEfficiency / allocation.BatteryDischargeW;
    }
}
