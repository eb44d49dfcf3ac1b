namespace DescentOps.Mission.Tether;

/// <summary>The link's timer for the instant relay number <see cref="Number"/> has drawn its battery flat.</summary>
public sealed record RelayBatteryDue(int Number);
