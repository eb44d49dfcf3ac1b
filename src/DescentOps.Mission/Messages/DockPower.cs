namespace DescentOps.Mission.Messages;

/// <summary>What the probe's bus now gives a docked vehicle's charger: its whole request, or nothing when the load is shed.</summary>
public sealed record DockPower(double PowerW);
