namespace DescentOps.Mission.Vehicles;

/// <summary>
/// The scenario's battery rule for turning home: at the return share of the battery, or when the next leg would leave
/// less than the way home needs on top of the reserve. The way home is estimated in still water, because the vehicle
/// does not know the current: that is the gap a team sets its return share against.
/// </summary>
public static class DockRule
{
    public const string AtReturnLevel = "battery at the return level";
    public const string NextLegTooCostly = "the next leg would leave too little to come home";

    /// <summary>Why the vehicle should turn home now, or null to carry on.</summary>
    public static string? ReturnReason(double batteryJ, double capacityJ, double returnAtFraction, double reserveFraction, double nextLegEnergyJ, double homeFromLegEndEnergyJ)
    {
        if (batteryJ <= returnAtFraction * capacityJ) return AtReturnLevel;
        if (batteryJ - nextLegEnergyJ - homeFromLegEndEnergyJ < reserveFraction * capacityJ) return NextLegTooCostly;
        return null;
    }
}
