namespace DescentOps.Physics.Power;

/// <summary>
/// One step of the battery's charge bookkeeping. Charges are in coulombs of the step's effective capacity, and they
/// balance exactly: EffectiveCapacityC·(SOC_end − SOC_start) = CoulombicEfficiency·AcceptedChargeC − DeliveredChargeC −
/// SelfDischargeC. <see cref="ShortfallC"/> is discharge the load asked for and did not get; <see cref="RejectedChargeC"/>
/// is charging current the pack turned away (full, or too cold).
/// </summary>
public sealed record BatteryStep(
    double StateOfCharge,
    double EffectiveCapacityC,
    double DeliveredChargeC,
    double AcceptedChargeC,
    double ChargingLossC,
    double SelfDischargeC,
    double ShortfallC,
    double RejectedChargeC,
    bool ChargingBlockedByCold);
