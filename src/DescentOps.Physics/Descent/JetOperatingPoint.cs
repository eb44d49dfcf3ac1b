namespace DescentOps.Physics.Descent;

/// <summary>
/// A hot-water jet operating point: the hole it cuts, the speed, the radial clearance around the probe, and how long
/// the water in that clearance takes to freeze back once the heat stops (the time a stopped probe has before it is
/// frozen in).
/// </summary>
public sealed record JetOperatingPoint(double HoleRadiusM, double SpeedMPerS, double ClearanceM, double FreezeBackTimeS);
