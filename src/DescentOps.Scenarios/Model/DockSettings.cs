namespace DescentOps.Scenarios.Model;

/// <summary>
/// The battery rule and the dock at the probe: return when the battery share falls to <see cref="ReturnAtFraction"/>
/// (or earlier, when the next leg would leave too little to come back), recharge at <see cref="ChargingPowerW"/>
/// (0 for none: the vehicle stays docked), and go out <see cref="Sorties"/> times in all.
/// </summary>
public sealed record DockSettings(double ReturnAtFraction, double ChargingPowerW, int Sorties);
