namespace DescentOps.Mission.Messages;

/// <summary>
/// A docked vehicle asks the probe's bus for its charging power (zero when it is full, leaves or is lost). The probe
/// answers with <see cref="DockPower"/> whenever what the bus grants it changes.
/// </summary>
public sealed record DockLoad(string Vehicle, double PowerW);
