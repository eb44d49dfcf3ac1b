namespace DescentOps.Mission.Vehicles;

/// <summary>
/// One leg of a task at nominal speed: its water velocity, the extent it covers along its governing axis (depth for
/// a dive or climb, distance for a transect) at <see cref="GoverningSpeedMPerS"/>, or a fixed <see cref="HoldS"/> on
/// station; the power drawn meanwhile and the energy spent at its end (a glider's pump stroke). A vertical leg ends at
/// <see cref="TargetDownM"/> exactly.
/// </summary>
public sealed record PlannedLeg(
    string Purpose,
    OceanVector WaterVelocity,
    double ExtentM,
    double GoverningSpeedMPerS,
    double HoldS,
    double PowerW,
    double EndEnergyJ,
    double? TargetDownM,
    bool EndsCycle)
{
    /// <summary>Duration at a share of the nominal speed.</summary>
    public double SecondsAt(double speedShare) => GoverningSpeedMPerS > 0 ? ExtentM / (GoverningSpeedMPerS * speedShare) : HoldS;

    /// <summary>Energy at the nominal speed: what the vehicle budgets before it starts the leg.</summary>
    public double NominalEnergyJ => (GoverningSpeedMPerS > 0 ? PowerW * ExtentM / GoverningSpeedMPerS : PowerW * HoldS) + EndEnergyJ;
}
