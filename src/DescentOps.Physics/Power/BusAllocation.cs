namespace DescentOps.Physics.Power;

/// <summary>
/// The bus at one instant: what the source and the harvester give, what the battery may add, which loads run and
/// which are shed, and where the difference goes. Powers balance exactly:
/// SourcePowerW + HarvestPowerW + BatteryDischargeW = Loads.SuppliedPowerW + BatteryChargeW + CurtailedW.
/// <see cref="AvailablePowerW"/> is source, harvester and the battery's discharge limit (no limit when it is empty).
/// </summary>
public sealed record BusAllocation(
    LoadAllocation Loads,
    double AvailablePowerW,
    double SourcePowerW,
    double HarvestPowerW,
    double BatteryDischargeW,
    double BatteryChargeW,
    double CurtailedW);
