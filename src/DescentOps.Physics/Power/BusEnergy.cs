namespace DescentOps.Physics.Power;

/// <summary>
/// Energy bookkeeping of the bus, in joules. The bus side balances:
/// SourceJ + HarvestJ + BatteryOutJ = LoadsJ + BatteryInJ + CurtailedJ, where LoadsJ is what the loads received
/// (<see cref="UnservedJ"/> is what they were allocated and did not get because the battery ran dry mid-step).
/// The cells balance too: change of stored energy = BatteryInJ − BatteryOutJ − BatteryLossJ − SelfDischargeJ.
/// </summary>
public sealed record BusEnergy(
    double SourceJ,
    double HarvestJ,
    double BatteryOutJ,
    double BatteryInJ,
    double LoadsJ,
    double UnservedJ,
    double CurtailedJ,
    double BatteryLossJ,
    double SelfDischargeJ)
{
    public static BusEnergy Zero { get; } = new(0, 0, 0, 0, 0, 0, 0, 0, 0);

    public BusEnergy Plus(BusEnergy other)
    {
        ArgumentNullException.ThrowIfNull(other);
        return new(
            SourceJ + other.SourceJ,
            HarvestJ + other.HarvestJ,
            BatteryOutJ + other.BatteryOutJ,
            BatteryInJ + other.BatteryInJ,
            LoadsJ + other.LoadsJ,
            UnservedJ + other.UnservedJ,
            CurtailedJ + other.CurtailedJ,
            BatteryLossJ + other.BatteryLossJ,
            SelfDischargeJ + other.SelfDischargeJ);
    }
}
